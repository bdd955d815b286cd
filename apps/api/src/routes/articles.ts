import { articleInputSchema, articleListQuerySchema, type ArticleInput } from '@tunnelwright/contracts';
import { Organisation, recordAudit, scopeToCaller, TestArticle, TestRecord } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { HttpError } from '../errors/http-error';
import { toArticle } from '../ingest/ingest-presenters';
import { sampleArticleBody, sampleArticleId } from './ingest-samples';
import { route, type RouteDef } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;

function columns(input: ArticleInput) {
  const { momentCentre, ...rest } = input;
  return { ...rest, momentCentreX: momentCentre.x, momentCentreY: momentCentre.y, momentCentreZ: momentCentre.z };
}

async function requireCustomerOrganisation(knex: Knex, id: string): Promise<void> {
  const organisation = await Organisation.query(knex).findById(id);
  if (!organisation || organisation.kind !== 'customer') throw HttpError.field('organisationId', 'Choose a customer organisation');
}

/** /api/articles: the objects customers send for testing. Staff keep them; customers read their own. */
export const articleRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: 'authenticated',
    summary: 'List test articles (customers: their own organisation)',
    query: articleListQuerySchema,
    sample: { expect: 200 },
    handler: async ({ caller, query, res }) => {
      const builder = scopeToCaller(TestArticle.query().orderBy('name'), caller);
      if (query.organisationId) builder.where('organisationId', query.organisationId);
      res.json((await builder).map(toArticle));
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: 'authenticated',
    summary: 'One test article',
    sample: { params: async (f) => ({ id: await sampleArticleId(f) }), expect: 200, crossOrganisation: true },
    handler: async ({ caller, params, res }) => {
      const article = await scopeToCaller(TestArticle.query(), caller).findById(params.id ?? '');
      if (!article) throw HttpError.notFound('The test article');
      res.json(toArticle(article));
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: staff,
    summary: 'Record a test article received from a customer',
    body: articleInputSchema,
    sample: { body: sampleArticleBody, expect: 201 },
    handler: async ({ caller, body, res, deps }) => {
      await requireCustomerOrganisation(deps.knex, body.organisationId);
      const created = await deps.knex.transaction(async (trx) => {
        const article = await TestArticle.query(trx).insert(columns(body)).returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'article.created', entity: 'article', entityId: article.id, after: toArticle(article) });
        return article;
      });
      res.status(201).json(toArticle(created));
    },
  }),
  route({
    method: 'put',
    path: '/:id',
    access: staff,
    summary: 'Edit a test article',
    body: articleInputSchema,
    sample: { params: async (f) => ({ id: await sampleArticleId(f) }), body: sampleArticleBody, expect: 200 },
    handler: async ({ caller, params, body, res, deps }) => {
      await requireCustomerOrganisation(deps.knex, body.organisationId);
      const updated = await deps.knex.transaction(async (trx) => {
        const article = await TestArticle.query(trx).findById(params.id ?? '').forUpdate();
        if (!article) throw HttpError.notFound('The test article');
        if (article.organisationId !== body.organisationId && (await TestRecord.query(trx).where('articleId', article.id).resultSize()) > 0) {
          throw HttpError.field('organisationId', 'An article already used by a test cannot move to another organisation');
        }
        const after = await TestArticle.query(trx).patchAndFetchById(article.id, columns(body));
        await recordAudit(trx, { actorId: caller.id, action: 'article.updated', entity: 'article', entityId: article.id, before: toArticle(article), after: toArticle(after) });
        return after;
      });
      res.json(toArticle(updated));
    },
  }),
  route({
    method: 'delete',
    path: '/:id',
    access: staff,
    summary: 'Remove a test article no test uses (409 otherwise)',
    sample: { params: async (f) => ({ id: await sampleArticleId(f) }), expect: 204 },
    handler: async ({ caller, params, res, deps }) => {
      await deps.knex.transaction(async (trx) => {
        const article = await TestArticle.query(trx).findById(params.id ?? '').forUpdate();
        if (!article) throw HttpError.notFound('The test article');
        if ((await TestRecord.query(trx).where('articleId', article.id).resultSize()) > 0) {
          throw new HttpError(409, 'Article in use', 'Tests refer to this article, so it is kept for their records.');
        }
        await TestArticle.query(trx).deleteById(article.id);
        await recordAudit(trx, { actorId: caller.id, action: 'article.deleted', entity: 'article', entityId: article.id, before: toArticle(article) });
      });
      res.status(204).end();
    },
  }),
];
