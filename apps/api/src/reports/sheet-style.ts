/** The sheet's look: A4, one typeface in three weights, a slate header band and a teal rule. */
export const SHEET_STYLE = {
  page: { size: 'A4' as const, width: 595.28, height: 841.89, marginLeft: 40, marginRight: 40, marginTop: 84, marginBottom: 92 },
  band: { height: 58 },
  footer: { top: 772, qrSize: 58 },
  fonts: { regular: 'tw-regular', medium: 'tw-medium', bold: 'tw-bold' },
  sizes: { title: 17, section: 10.5, body: 8.6, small: 7.2, table: 7.4, band: 12 },
  colours: {
    band: '#e9eef2',
    bandText: '#1d3340',
    accent: '#1f7a78',
    text: '#1b1b1b',
    muted: '#555f66',
    rule: '#9aa7b0',
    tableHead: '#dfe6eb',
    zebra: '#f4f6f8',
    warning: '#a3261c',
    cautionFill: '#fbf3e6',
    cautionRule: '#b7791f',
  },
} as const;
