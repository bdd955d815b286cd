import { BaseModel } from '../base-model';

/** A file a customer attached to a booking (drawings, test plans); stored content-addressed by SHA-256. */
export class BookingAttachment extends BaseModel {
  static override tableName = 'booking_attachments';

  bookingId!: string;
  filename!: string;
  contentType!: string;
  sizeBytes!: number;
  sha256!: string;
  uploadedBy!: string;

  /** sizeBytes: bigint columns, which pg hands over as strings; amounts stay far below 2^53. */
  override $parseDatabaseJson(json: Record<string, unknown>): Record<string, unknown> {
    const parsed = super.$parseDatabaseJson(json);
    for (const key of ['sizeBytes']) if (typeof parsed[key] === 'string') parsed[key] = Number(parsed[key]);
    return parsed;
  }
}
