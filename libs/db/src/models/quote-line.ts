import type { QuoteLineKind } from '@tunnelwright/contracts';
import { BaseModel } from '../base-model';

/** One line of a quote: quantity × unit price = line total, all money in integer minor units. */
export class QuoteLine extends BaseModel {
  static override tableName = 'quote_lines';

  quoteId!: string;
  position!: number;
  kind!: QuoteLineKind;
  description!: string;
  quantity!: number;
  unitPriceMinor!: number;
  lineTotalMinor!: number;

  /** unitPriceMinor, lineTotalMinor: bigint columns, which pg hands over as strings; amounts stay far below 2^53. */
  override $parseDatabaseJson(json: Record<string, unknown>): Record<string, unknown> {
    const parsed = super.$parseDatabaseJson(json);
    for (const key of ['unitPriceMinor', 'lineTotalMinor']) if (typeof parsed[key] === 'string') parsed[key] = Number(parsed[key]);
    return parsed;
  }
}
