import type { MeasuredValue } from './result-sheet-data';

/** Typographic minus for negative numbers, as printed on the sheet. */
function minus(text: string): string {
  return text.startsWith('-') ? `−${text.slice(1)}` : text;
}

/** A number with fixed decimals and a true minus sign; "−0.0000" is printed as "0.0000". */
export function formatNumber(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  return Number(text) === 0 ? (0).toFixed(decimals) : minus(text);
}

/** "value ± U" with the same decimals for both. */
export function formatMeasured(m: MeasuredValue, decimals: number): string {
  return `${formatNumber(m.value, decimals)} ± ${m.expandedUncertainty.toFixed(decimals)}`;
}

/** "low – high" of a set of values, or one value when they agree at that precision. */
export function formatRange(values: number[], decimals: number): string {
  const low = formatNumber(Math.min(...values), decimals);
  const high = formatNumber(Math.max(...values), decimals);
  return low === high ? low : `${low} – ${high}`;
}

/** ISO date as printed on the sheet, e.g. "3 November 2026" (UTC calendar, no local time shift). */
export function formatDate(isoDate: string): string {
  const months = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];
  const match = /^(\d{4})-(\d{2})-(\d{2})$/.exec(isoDate);
  if (!match) throw new Error(`Expected a YYYY-MM-DD date, got "${isoDate}"`);
  return `${Number(match[3])} ${months[Number(match[2]) - 1]} ${match[1]}`;
}
