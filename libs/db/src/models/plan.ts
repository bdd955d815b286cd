import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { Organisation } from './organisation';
import { PlanVersion } from './plan-version';

/**
 * A test plan of a customer organisation. Its inputs live in versions; `currentVersion` is the newest.
 * `bookingId` links a booking once bookings take plans; `measuredDragArea` (full-scale C_D·A, m²) with
 * `measuredSource` is the measured value the estimate is compared with, taken from the issued result sheet
 * `measuredSheetId` (one point of one configuration; null only for values typed in before sheets existed).
 */
export class Plan extends BaseModel {
  static override tableName = 'plans';

  organisationId!: string;
  name!: string;
  currentVersion!: number;
  bookingId!: string | null;
  measuredDragArea!: number | null;
  measuredSource!: string | null;
  measuredSheetId!: string | null;
  measuredConfigurationCode!: string | null;
  measuredConfigurationLabel!: string | null;
  measuredYaw!: number | null;
  measuredSheetDragArea!: number | null;
  measuredSheetUncertainty!: number | null;
  measuredScale!: number | null;
  measuredExpandedUncertainty!: number | null;
  measuredLinkedBy!: string | null;
  measuredLinkedAt!: Date | null;
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
