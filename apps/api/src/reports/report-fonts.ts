import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { GlobalFonts } from '@napi-rs/canvas';
import { woffToSfnt } from './woff-to-sfnt';

const require = createRequire(import.meta.url);

/** Roboto (Latin subset, WOFF) shipped by @fontsource/roboto: the one face of the sheet and its charts. */
export const REPORT_FONT_FILES = {
  regular: require.resolve('@fontsource/roboto/files/roboto-latin-400-normal.woff'),
  medium: require.resolve('@fontsource/roboto/files/roboto-latin-500-normal.woff'),
  bold: require.resolve('@fontsource/roboto/files/roboto-latin-700-normal.woff'),
} as const;

/** Family name the charts are drawn with. */
export const CHART_FONT_FAMILY = 'Tunnelwright Roboto';

let registered = false;
let sfnt: Record<keyof typeof REPORT_FONT_FILES, Buffer> | undefined;

/** Registers the sheet's font with the canvas once per process. */
export function registerChartFont(): void {
  if (registered) return;
  GlobalFonts.registerFromPath(REPORT_FONT_FILES.regular, CHART_FONT_FAMILY);
  GlobalFonts.registerFromPath(REPORT_FONT_FILES.bold, CHART_FONT_FAMILY);
  registered = true;
}

/** The three weights as plain TrueType bytes for pdfkit, unpacked once per process. */
export function reportFontBytes(): Record<keyof typeof REPORT_FONT_FILES, Buffer> {
  sfnt ??= {
    regular: woffToSfnt(readFileSync(REPORT_FONT_FILES.regular)),
    medium: woffToSfnt(readFileSync(REPORT_FONT_FILES.medium)),
    bold: woffToSfnt(readFileSync(REPORT_FONT_FILES.bold)),
  };
  return sfnt;
}
