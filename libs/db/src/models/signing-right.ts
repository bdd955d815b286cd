import { BaseModel } from '../base-model';

/** A lab manager's grant of the right to approve results and sign result sheets; revoked rather than deleted. */
export class SigningRight extends BaseModel {
  static override tableName = 'signing_rights';

  userId!: string;
  grantedBy!: string;
  scopeNote!: string;
  revokedAt!: Date | null;
  revokedBy!: string | null;
  revokedReason!: string | null;
}
