import { pino } from 'pino';

/** The worker's structured logger; `LOG_LEVEL` (default `info`) sets how much it says. */
export const logger = pino({ name: 'tunnelwright-worker', level: process.env.LOG_LEVEL ?? 'info' });
