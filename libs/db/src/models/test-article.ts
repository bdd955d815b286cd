import type { ArticleKind, ReferenceAreaKind } from '@tunnelwright/contracts';
import { Model, type RelationMappings } from 'objection';
import { BaseModel } from '../base-model';
import { Organisation } from './organisation';

/**
 * A customer's object under test. Quantities are SI: reference area and frontal area in m², reference
 * length and moment centre in m, volume in m³; scale is full-scale length over model length.
 */
export class TestArticle extends BaseModel {
  static override tableName = 'test_articles';

  organisationId!: string;
  name!: string;
  description!: string;
  kind!: ArticleKind;
  conditionOnReceipt!: string;
  referenceArea!: number;
  referenceAreaKind!: ReferenceAreaKind;
  referenceLength!: number;
  volume!: number;
  frontalArea!: number | null;
  momentCentreX!: number;
  momentCentreY!: number;
  momentCentreZ!: number;
  scale!: number;

  organisation?: Organisation;

  static override relationMappings = (): RelationMappings => ({
    organisation: {
      relation: Model.BelongsToOneRelation,
      modelClass: Organisation,
      join: { from: 'test_articles.organisationId', to: 'organisations.id' },
    },
  });
}
