import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { Organisation } from './organisation';
import { PlanVersion } from './plan-version';

/**
 * A test plan of a customer organisation. Its inputs live in versions; `currentVersion` is the newest.
 * `bookingId` links a booking once bookings take plans; `measuredDragArea` (m²) with `measuredSource` links
 * certified results to compare the estimate with.
 */
export class Plan extends BaseModel {
  static override tableName = 'plans';

  organisationId!: string;
  name!: string;
  currentVersion!: number;
  bookingId!: string | null;
  measuredDragArea!: number | null;
  measuredSource!: string | null;
  createdBy!: string;

  organisation?: Organisation;
  versions?: PlanVersion[];

  static override relationMappings = (): RelationMappings => ({
    organisation: {
      relation: Model.BelongsToOneRelation,
      modelClass: Organisation,
      join: { from: 'plans.organisationId', to: 'organisations.id' },
    },
    versions: {
      relation: Model.HasManyRelation,
      modelClass: PlanVersion,
      join: { from: 'plans.id', to: 'plan_versions.planId' },
    },
  });
}
