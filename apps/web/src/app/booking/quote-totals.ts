import type { QuoteLineInput } from '@tunnelwright/contracts';

/** Total of one quote line in integer minor units. */
export function lineTotalMinor(line: Pick<QuoteLineInput, 'quantity' | 'unitPriceMinor'>): number {
  return line.quantity * line.unitPriceMinor;
}

/** Sum of the lines in integer minor units; lines with a missing or non-integer figure count as zero. */
export function quoteTotalMinor(lines: readonly Pick<QuoteLineInput, 'quantity' | 'unitPriceMinor'>[]): number {
  return lines.reduce((sum, line) => (Number.isInteger(line.quantity) && Number.isInteger(line.unitPriceMinor) ? sum + lineTotalMinor(line) : sum), 0);
}
