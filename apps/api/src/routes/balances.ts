import { balanceInputSchema, calibrationInputSchema } from '@tunnelwright/contracts';
import { Balance, BalanceCalibration, recordAudit, Tunnel, User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { HttpError } from '../errors/http-error';
import { currentCalibration } from '../ingest/calibration-check';
import { toBalance, toCalibration } from '../ingest/ingest-presenters';
import { sampleBalanceBody, sampleBalanceId, sampleCalibrationBody } from './ingest-samples';
import { route, type RouteDef } from './route';

const staff = ['technician', 'analyst', 'lab_manager'] as const;

/** 400 on `tunnelId` unless it names a tunnel of the live catalogue. */
async function checkTunnel(knex: Knex, tunnelId: string | null): Promise<void> {
  if (tunnelId === null) return;
  const tunnel = await Tunnel.query(knex).select('id', 'archivedAt').findById(tunnelId);
  if (!tunnel || tunnel.archivedAt) throw HttpError.field('tunnelId', 'Choose a tunnel of the catalogue; this one does not exist or is archived');
}

/** /api/balances: the lab's balances and their calibration versions. Lab managers keep them; staff read. */
export const balanceRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/',
    access: staff,
    summary: 'List balances with their current calibration',
    sample: { expect: 200 },
    handler: async ({ res, deps }) => {
      const balances = await Balance.query().orderBy('identifier');
      res.json(await Promise.all(balances.map(async (b) => toBalance(b, await currentCalibration(deps.knex, b.id)))));
    },
  }),
  route({
    method: 'get',
    path: '/:id',
    access: staff,
    summary: 'One balance with its current calibration',
    sample: { params: async (f) => ({ id: await sampleBalanceId(f) }), expect: 200 },
    handler: async ({ params, res, deps }) => {
      const balance = await Balance.query().findById(params.id ?? '');
      if (!balance) throw HttpError.notFound('The balance');
      res.json(toBalance(balance, await currentCalibration(deps.knex, balance.id)));
    },
  }),
  route({
    method: 'post',
    path: '/',
    access: ['lab_manager'],
    summary: 'Add a balance',
    body: balanceInputSchema,
    sample: { body: sampleBalanceBody, expect: 201 },
    handler: async ({ caller, body, res, deps }) => {
      await checkTunnel(deps.knex, body.tunnelId);
      const created = await deps.knex.transaction(async (trx) => {
        const balance = await Balance.query(trx).insert(body).returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'balance.created', entity: 'balance', entityId: balance.id, after: toBalance(balance, undefined) });
        return balance;
      });
      res.status(201).json(toBalance(created, undefined));
    },
  }),
  route({
    method: 'put',
    path: '/:id',
    access: ['lab_manager'],
    summary: 'Edit a balance',
    body: balanceInputSchema,
    sample: { params: async (f) => ({ id: await sampleBalanceId(f) }), body: sampleBalanceBody, expect: 200 },
    handler: async ({ caller, params, body, res, deps }) => {
      await checkTunnel(deps.knex, body.tunnelId);
      const updated = await deps.knex.transaction(async (trx) => {
        const balance = await Balance.query(trx).findById(params.id ?? '').forUpdate();
        if (!balance) throw HttpError.notFound('The balance');
        const after = await Balance.query(trx).patchAndFetchById(balance.id, body);
        await recordAudit(trx, { actorId: caller.id, action: 'balance.updated', entity: 'balance', entityId: balance.id, before: balance, after });
        return after;
      });
      res.json(toBalance(updated, await currentCalibration(deps.knex, updated.id)));
    },
  }),
  route({
    method: 'get',
    path: '/:id/calibrations',
    access: staff,
    summary: 'Every calibration version of a balance, newest first, with who entered it',
    sample: { params: async (f) => ({ id: await sampleBalanceId(f) }), expect: 200 },
    handler: async ({ params, res }) => {
      const balance = await Balance.query().findById(params.id ?? '');
      if (!balance) throw HttpError.notFound('The balance');
      const calibrations = await BalanceCalibration.query().where('balanceId', balance.id).orderBy('version', 'desc');
      const people = await User.query().whereIn('id', [...new Set(calibrations.map((c) => c.enteredBy))]).select('id', 'name');
      const names = new Map(people.map((person) => [person.id, person.name]));
      res.json(calibrations.map((c) => ({ ...toCalibration(c), enteredByName: names.get(c.enteredBy) ?? '' })));
    },
  }),
  route({
    method: 'post',
    path: '/:id/calibrations',
    access: ['lab_manager'],
    summary: 'Record a new calibration version (earlier versions are kept)',
    body: calibrationInputSchema,
    sample: { params: async (f) => ({ id: await sampleBalanceId(f) }), body: sampleCalibrationBody, expect: 201 },
    handler: async ({ caller, params, body, res, deps }) => {
      const created = await deps.knex.transaction(async (trx) => {
        const balance = await Balance.query(trx).findById(params.id ?? '').forUpdate();
        if (!balance) throw HttpError.notFound('The balance');
        const latest = await BalanceCalibration.query(trx).where('balanceId', balance.id).orderBy('version', 'desc').first();
        const calibration = await BalanceCalibration.query(trx)
          .insert({ balanceId: balance.id, version: (latest?.version ?? 0) + 1, matrices: body.matrices, calibratedOn: body.calibratedOn, dueOn: body.dueOn, enteredBy: caller.id })
          .returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'balance.calibrated', entity: 'balance', entityId: balance.id, after: toCalibration(calibration) });
        return calibration;
      });
      res.status(201).json(toCalibration(created));
    },
  }),
];
