import { BaseModel } from '../base-model';

/**
 * An uploaded raw balance file: content-addressed in the raw store by `storageKey`, `size` in bytes,
 * `sha256` hex. Immutable: a database trigger rejects deleting the row or changing hash, size, key or run.
 */
export class RawFile extends BaseModel {
  static override tableName = 'raw_files';

  runId!: string;
  originalName!: string;
  size!: number;
  sha256!: string;
  storageKey!: string;
  uploadedBy!: string;

  /** `size` is a bigint column, which pg hands over as a string; files stay far below 2^53 bytes. */
  override $parseDatabaseJson(json: Record<string, unknown>): Record<string, unknown> {
    const parsed = super.$parseDatabaseJson(json);
    if (typeof parsed['size'] === 'string') parsed['size'] = Number(parsed['size']);
    return parsed;
  }
}
