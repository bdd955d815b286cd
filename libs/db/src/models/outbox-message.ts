import { BaseModel } from '../base-model';

/**
 * A job written in the same transaction as the change that needs it; a dispatcher sends it to its BullMQ
 * queue after commit (and again at start-up if the process died first). `jobId` makes re-sending harmless.
 */
export class OutboxMessage extends BaseModel {
  static override tableName = 'outbox';

  queue!: string;
  jobName!: string;
  jobId!: string;
  payload!: Record<string, unknown>;
  dispatchedAt!: Date | null;

  static override get jsonAttributes(): string[] {
    return ['payload'];
  }
}
