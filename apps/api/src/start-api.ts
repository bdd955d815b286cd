import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { queuePrefix, startReductionOutboxDispatcher } from '@tunnelwright/db';
import { pino } from 'pino';
import { createApp } from './app';
import type { AppDeps } from './deps';
import { ingestServices } from './ingest/ingest-services';

/** How often the API re-sends undispatched outbox messages, ms: one indexed query when there are none. */
export const apiDispatchEveryMs = 30_000;

/** A listening API; `close` stops taking connections and the outbox loop. The deps stay open: they are the caller's. */
export interface RunningApi {
  server: Server;
  /** The port actually listened on (useful with port 0). */
  port: number;
  close(): Promise<void>;
}

/**
 * Starts the API: listens on `port` (default the configured one), then dispatches the reduction outbox
 * once and every `dispatchEveryMs`. An upload sends its own message right after commit; this catches
 * the message of an API that died in between, without waiting for a worker to start. A failed round is
 * logged, never fatal: Redis may come up after the API, and the next round sends what is waiting.
 */
export async function startApi(deps: AppDeps, options: { port?: number; host?: string; dispatchEveryMs?: number } = {}): Promise<RunningApi> {
  const app = createApp(deps);
  // Read before listening, so a bad ingest setting stops the start instead of the first upload.
  const { reductionQueue } = ingestServices(deps);
  const server = createServer(app);
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen({ port: options.port ?? deps.config.port, host: options.host }, resolve);
  });
  const dispatcher = await startReductionOutboxDispatcher(deps.knex, reductionQueue, {
    prefix: queuePrefix(),
    everyMs: options.dispatchEveryMs ?? apiDispatchEveryMs,
    logger: pino({ name: 'tunnelwright-api', level: deps.config.logLevel }),
  });
  return {
    server,
    port: (server.address() as AddressInfo).port,
    async close() {
      await Promise.all([dispatcher.stop(), new Promise<void>((resolve) => server.close(() => resolve()))]);
    },
  };
}
