import type { ServiceUnit } from '@tunnelwright/contracts';
import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { Tunnel } from './tunnel';

/** A bookable service of the catalogue. `rate` is integer minor units of `currency` per `unit`. */
export class Service extends BaseModel {
  static override tableName = 'services';

  name!: string;
  description!: string;
  unit!: ServiceUnit;
  rate!: number;
  currency!: string;
  tunnelId!: string | null;
  archivedAt!: Date | null;

  tunnel?: Tunnel;

  /** `rate` is a bigint column, which pg hands over as a string; rates stay far below 2^53. */
  override $parseDatabaseJson(json: Record<string, unknown>): Record<string, unknown> {
    const parsed = super.$parseDatabaseJson(json);
    if (typeof parsed['rate'] === 'string') parsed['rate'] = Number(parsed['rate']);
    return parsed;
  }

  static override relationMappings = (): RelationMappings => ({
    tunnel: {
      relation: Model.BelongsToOneRelation,
      modelClass: Tunnel,
      join: { from: 'services.tunnelId', to: 'tunnels.id' },
    },
  });
}
