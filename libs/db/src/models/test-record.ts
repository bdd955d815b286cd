import type { ReductionSettings, TestConfiguration, TestState } from '@tunnelwright/contracts';
import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { Balance } from './balance';
import { TestArticle } from './test-article';
import { Tunnel } from './tunnel';

/** A test: one customer's article in one tunnel on one balance, with its named model configurations. */
export class TestRecord extends BaseModel {
  static override tableName = 'tests';

  organisationId!: string;
  articleId!: string;
  tunnelId!: string;
  balanceId!: string | null;
  bookingId!: string | null;
  title!: string;
  state!: TestState;
  configurations!: TestConfiguration[];
  reductionSettings!: ReductionSettings;
  createdBy!: string;

  article?: TestArticle;
  tunnel?: Tunnel;
  balance?: Balance | null;

  static override get jsonAttributes(): string[] {
    return ['configurations', 'reductionSettings'];
  }

  static override relationMappings = (): RelationMappings => ({
    article: { relation: Model.BelongsToOneRelation, modelClass: TestArticle, join: { from: 'tests.articleId', to: 'test_articles.id' } },
    tunnel: { relation: Model.BelongsToOneRelation, modelClass: Tunnel, join: { from: 'tests.tunnelId', to: 'tunnels.id' } },
    balance: { relation: Model.BelongsToOneRelation, modelClass: Balance, join: { from: 'tests.balanceId', to: 'balances.id' } },
  });
}
