/** Formats integer minor units (e.g. cents) as money, e.g. 125000 EUR → "€1,250.00". */
export function formatMoney(minorUnits: number, currency: string, locale = 'en-GB'): string {
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(fromMinorUnits(minorUnits, currency));
}

/** Number of decimals a currency uses for its minor unit (2 for EUR, 0 for JPY). */
export function minorUnitDigits(currency: string): number {
  try {
    return new Intl.NumberFormat('en-GB', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
  } catch {
    return 2;
  }
}

/** Converts a decimal amount typed by a person to integer minor units, rounding to the nearest unit. */
export function toMinorUnits(amount: number, currency: string): number {
  return Math.round(amount * 10 ** minorUnitDigits(currency));
}

/** Converts integer minor units back to the decimal amount a person edits. */
export function fromMinorUnits(minorUnits: number, currency: string): number {
  return minorUnits / 10 ** minorUnitDigits(currency);
}
