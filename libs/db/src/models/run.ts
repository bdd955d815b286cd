import type { RunKind } from '@tunnelwright/contracts';
import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { TestRecord } from './test-record';

/** One run of a test, numbered within the test; one raw balance file is uploaded per run. */
export class Run extends BaseModel {
  static override tableName = 'runs';

  testId!: string;
  runNumber!: number;
  kind!: RunKind;
  configurationLabel!: string;
  notes!: string;
  createdBy!: string;

  test?: TestRecord;

  static override relationMappings = (): RelationMappings => ({
    test: { relation: Model.BelongsToOneRelation, modelClass: TestRecord, join: { from: 'runs.testId', to: 'tests.id' } },
  });
}
