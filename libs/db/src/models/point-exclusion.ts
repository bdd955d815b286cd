import { BaseModel } from '../base-model';

/** A point an analyst leaves out of the result (`pointIndex` is `reduction_points.index`), with the written reason. */
export class PointExclusion extends BaseModel {
  static override tableName = 'point_exclusions';

  reductionId!: string;
  pointIndex!: number;
  reason!: string;
  excludedBy!: string;
}
