import { createKnex } from '@tunnelwright/db';
import { Redis } from 'ioredis';
import { loadConfig } from './config';
import { createSmtpMailer } from './mail/mailer';
import { startApi } from './start-api';

const config = loadConfig();
const knex = createKnex(config.databaseUrl);
const redis = new Redis(config.redisUrl, { maxRetriesPerRequest: 3, lazyConnect: false });
const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
const api = await startApi({ config, knex, redis, mailer });
console.log(`Tunnelwright API listening on port ${api.port} (public URL ${config.publicUrl}${config.demoMode ? ', demo mode' : ''})`);

function shutdown(signal: string): void {
  console.log(`${signal} received, closing`);
  api.close().finally(() => {
    mailer.close();
    Promise.allSettled([knex.destroy(), redis.quit()]).then(() => process.exit(0));
  });
  // Connections kept alive by browsers must not hold the process forever.
  setTimeout(() => process.exit(0), 10_000).unref();
}
process.on('SIGTERM', () => shutdown('SIGTERM'));
process.on('SIGINT', () => shutdown('SIGINT'));
