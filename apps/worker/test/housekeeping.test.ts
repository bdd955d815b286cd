import { randomBytes, randomUUID } from 'node:crypto';
import { createKnex, Organisation, RefreshToken, Tunnel, User, UserToken } from '@tunnelwright/db';
import { QueueEvents, type Job } from 'bullmq';
import { Redis } from 'ioredis';
import type { Knex } from 'knex';
import { pino } from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { purgeExpiredTokens } from '../src/housekeeping/purge-expired-tokens';
import { housekeepingJobs, queueNames } from '../src/queues';
import { startWorker, type RunningWorker } from '../src/start-worker';

const databaseUrl = process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:54329/tunnelwright_test';
const redisUrl = process.env.REDIS_URL ?? 'redis://127.0.0.1:63790/1';
const hour = 60 * 60 * 1000;

function tokenHash(): string {
  return randomBytes(32).toString('hex');
}

describe('housekeeping worker', () => {
  let knex: Knex;
  let userId: string;
  let running: RunningWorker;
  let events: QueueEvents;
  let eventsConnection: Redis;
  // A prefix of its own: the test never sees jobs of another run or of a worker started by `npm start`.
  const prefix = `tw-test-${randomUUID()}`;

  /** Token rows named by what the purge must do with them. */
  const ids: Record<string, string> = {};

  /** Replaces the test user's tokens with one of each kind. */
  async function seedTokens(): Promise<void> {
    await RefreshToken.query(knex).delete().where('userId', userId);
    await UserToken.query(knex).delete().where('userId', userId);
    const now = Date.now();
    const refresh = async (label: string, expiresIn: number, extra: Partial<RefreshToken> = {}) => {
      const row = await RefreshToken.query(knex).insert({
        userId,
        tokenHash: tokenHash(),
        familyId: randomUUID(),
        expiresAt: new Date(now + expiresIn),
        ...extra,
      });
      ids[label] = row.id;
    };
    const link = async (label: string, expiresIn: number, usedAt: Date | null) => {
      const row = await UserToken.query(knex).insert({
        userId,
        purpose: 'password_reset',
        tokenHash: tokenHash(),
        expiresAt: new Date(now + expiresIn),
        usedAt,
      });
      ids[label] = row.id;
    };
    await refresh('refresh expired', -hour);
    await refresh('refresh valid', 7 * 24 * hour);
    await refresh('refresh rotated, not expired', 24 * hour, { rotatedAt: new Date(now - hour) });
    await link('link expired', -hour, null);
    await link('link used', hour, new Date(now - 60_000));
    await link('link valid', hour, null);
  }

  async function remaining(): Promise<{ refresh: string[]; link: string[] }> {
    const refresh = await RefreshToken.query(knex).where('userId', userId).select('id');
    const link = await UserToken.query(knex).where('userId', userId).select('id');
    const label = (id: string) => Object.keys(ids).find((key) => ids[key] === id) ?? id;
    return { refresh: refresh.map((row) => label(row.id)).sort(), link: link.map((row) => label(row.id)).sort() };
  }

  beforeAll(async () => {
    knex = createKnex(databaseUrl);
    const organisation = await Organisation.query(knex).insert({ name: `Housekeeping test ${randomUUID()}`, kind: 'customer' });
    const user = await User.query(knex).insert({
      email: `housekeeping-${randomUUID()}@example.invalid`,
      name: 'Housekeeping Test User',
      role: 'customer',
      organisationId: organisation.id,
    });
    userId = user.id;
    running = await startWorker({ redisUrl, databaseUrl, prefix, logger: pino({ level: 'silent' }), purgeEveryMs: hour });
    eventsConnection = new Redis(redisUrl, { maxRetriesPerRequest: null });
    events = new QueueEvents(queueNames.housekeeping, { connection: eventsConnection, prefix });
    await events.waitUntilReady();
  });

  afterAll(async () => {
    await running?.close();
    await events?.close();
    await eventsConnection?.quit();
    if (knex) {
      const cleaner = new Redis(redisUrl);
      const keys = await cleaner.keys(`${prefix}:*`);
      if (keys.length > 0) await cleaner.del(...keys);
      await cleaner.quit();
      await User.query(knex).delete().where('id', userId);
      await knex.destroy();
    }
  });

  describe('purgeExpiredTokens', () => {
    it('deletes expired refresh tokens and used or expired link tokens, and keeps the rest', async () => {
      await seedTokens();
      await purgeExpiredTokens(knex);
      expect(await remaining()).toEqual({
        refresh: ['refresh rotated, not expired', 'refresh valid'],
        link: ['link valid'],
      });
    });

    it('deletes nothing more when run again', async () => {
      const counts = await purgeExpiredTokens(knex);
      expect(counts).toEqual({ refreshTokens: 0, userTokens: 0 });
      expect((await remaining()).refresh).toHaveLength(2);
    });
  });

  describe('the housekeeping queue', () => {
    it('registers one repeatable purge, however often the schedule is upserted', async () => {
      const schedulers = await running.housekeepingQueue.getJobSchedulers();
      expect(schedulers.map((scheduler) => scheduler.key).sort()).toEqual(
        [housekeepingJobs.expireLapsedHolds, housekeepingJobs.purgeExpiredTokens].sort(),
      );
    });

    it('runs a purge job through Redis and reports what it deleted', async () => {
      await seedTokens();
      const job = await running.housekeepingQueue.add(housekeepingJobs.purgeExpiredTokens, {});
      const result = (await job.waitUntilFinished(events, 30_000)) as { refreshTokens: number; userTokens: number };
      // The schedule runs its first purge at start-up, before these rows existed.
      expect(result).toEqual({ refreshTokens: 1, userTokens: 2 });
      expect(await remaining()).toEqual({
        refresh: ['refresh rotated, not expired', 'refresh valid'],
        link: ['link valid'],
      });
    });

    it('expires a booking hold whose time has run out, and leaves a live hold alone', async () => {
      const tunnel = await Tunnel.query(knex).insert({
        name: `Housekeeping tunnel ${randomUUID()}`,
        kind: 'closed',
        description: '',
        width: 2,
        height: 1.5,
        area: 2.9,
        length: 4.5,
        minSpeed: 0,
        maxSpeed: 50,
        pressureGradient: 0,
        shapeFactor: 0.86,
        openJetConstants: {},
        capabilities: {},
      });
      const organisationId = (await User.query(knex).findById(userId))!.organisationId;
      const booking = (period: string, holdExpiresAt: Date) => ({
        organisation_id: organisationId,
        tunnel_id: tunnel.id,
        requested_by: userId,
        period,
        state: 'requested',
        hold_expires_at: holdExpiresAt,
        ics_uid: `${randomUUID()}@housekeeping.test`,
      });
      const [lapsed] = await knex('bookings')
        .insert(booking('[2031-03-03 09:00Z,2031-03-03 13:00Z)', new Date(Date.now() - hour)))
        .returning('id');
      const [live] = await knex('bookings')
        .insert(booking('[2031-03-04 09:00Z,2031-03-04 13:00Z)', new Date(Date.now() + hour)))
        .returning('id');
      try {
        const job = await running.housekeepingQueue.add(housekeepingJobs.expireLapsedHolds, {});
        const result = (await job.waitUntilFinished(events, 30_000)) as { expired: number };
        expect(result.expired).toBeGreaterThanOrEqual(1);
        const states = await knex('bookings').whereIn('id', [lapsed.id, live.id]).select('id', 'state');
        expect(Object.fromEntries(states.map((row: { id: string; state: string }) => [row.id, row.state]))).toEqual({
          [lapsed.id]: 'expired',
          [live.id]: 'requested',
        });
      } finally {
        await knex('bookings').whereIn('id', [lapsed.id, live.id]).delete();
        await knex('audit_log').where('entity_id', lapsed.id).delete().catch(() => undefined);
        await Tunnel.query(knex).deleteById(tunnel.id);
      }
    });

    it('fails a job with an unknown name at once, without retrying it', async () => {
      const job: Job = await running.housekeepingQueue.add('no-such-job', {}, { attempts: 3 });
      await expect(job.waitUntilFinished(events, 30_000)).rejects.toThrow('housekeeping has no job named "no-such-job"');
      const failed = await running.housekeepingQueue.getJob(job.id ?? '');
      expect(failed?.attemptsMade).toBe(1);
    });
  });
});
