/**
 * Queue and job names shared by the worker and whoever enqueues (the API). Job payloads carry ids only,
 * never data or secrets: a processor reads what it needs from the database.
 */

/** BullMQ queue names. */
export const queueNames = {
  /** Reduction of uploaded raw balance files into coefficient tables (one job per run, payload `{ runId }`). */
  reductions: 'reductions',
  /** Periodic clean-up of the database. */
  housekeeping: 'housekeeping',
} as const;

/** Job names on the housekeeping queue. */
export const housekeepingJobs = {
  /** Deletes expired refresh tokens and used or expired single-use link tokens. */
  purgeExpiredTokens: 'purge-expired-tokens',
  /** Flips provisional booking holds whose hold time has run out to expired, freeing their slots. */
  expireLapsedHolds: 'expire-lapsed-holds',
} as const;

/** How often the token purge runs, in milliseconds (hourly). */
export const purgeExpiredTokensEveryMs = 60 * 60 * 1000;

/** How often lapsed booking holds are swept, in milliseconds (every five minutes). */
export const expireLapsedHoldsEveryMs = 5 * 60 * 1000;
