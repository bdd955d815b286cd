import type { QuoteState } from '@tunnelwright/contracts';
import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { QuoteLine } from './quote-line';

/** The lab's price for a booking; the total is the sum of its lines in integer minor units. */
export class Quote extends BaseModel {
  static override tableName = 'quotes';

  bookingId!: string;
  state!: QuoteState;
  currency!: string;
  totalMinor!: number;
  note!: string;
  createdBy!: string;

  /** totalMinor: bigint columns, which pg hands over as strings; amounts stay far below 2^53. */
  override $parseDatabaseJson(json: Record<string, unknown>): Record<string, unknown> {
    const parsed = super.$parseDatabaseJson(json);
    for (const key of ['totalMinor']) if (typeof parsed[key] === 'string') parsed[key] = Number(parsed[key]);
    return parsed;
  }

  lines?: QuoteLine[];

  static override relationMappings = (): RelationMappings => ({
    lines: { relation: Model.HasManyRelation, modelClass: QuoteLine, join: { from: 'quotes.id', to: 'quote_lines.quoteId' } },
  });
}
