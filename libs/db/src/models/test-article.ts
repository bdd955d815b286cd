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
  /** Day the laboratory received the item (`YYYY-MM-DD`), if recorded. */
  receivedOn!: string | null;
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

  /** pg turns a `date` into a Date at local midnight; keep the calendar date it names instead. */
  override $parseDatabaseJson(json: Record<string, unknown>): Record<string, unknown> {
    const parsed = super.$parseDatabaseJson(json);
    const value = parsed['receivedOn'];
    if (value instanceof Date) {
      parsed['receivedOn'] = `${value.getFullYear()}-${String(value.getMonth() + 1).padStart(2, '0')}-${String(value.getDate()).padStart(2, '0')}`;
    }
    return parsed;
  }

  static override relationMappings = (): RelationMappings => ({
    organisation: {
      relation: Model.BelongsToOneRelation,
      modelClass: Organisation,
      join: { from: 'test_articles.organisationId', to: 'organisations.id' },
    },
  });
}
