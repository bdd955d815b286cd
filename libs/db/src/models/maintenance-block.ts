import { BaseModel } from '../base-model';

/** A period when a tunnel is closed for maintenance; it occupies the tunnel like a booking does. */
export class MaintenanceBlock extends BaseModel {
  static override tableName = 'maintenance_blocks';

  tunnelId!: string;
  /** PostgreSQL `tstzrange` ('[)') as text. */
  period!: string;
  reason!: string;
  createdBy!: string;
}
