import { createKnex } from '@tunnelwright/db';
import { Redis } from 'ioredis';
import { createApp } from './app';
import { loadConfig } from './config';
import { createSmtpMailer } from './mail/mailer';

const config = loadConfig();
const knex = createKnex(config.databaseUrl);
const redis = new Redis(config.redisUrl, { maxRetriesPerRequest: 3, lazyConnect: false });
const mailer = createSmtpMailer(config.smtpUrl, config.mailFrom);
const app = createApp({ config, knex, redis, mailer });

const server = app.listen(config.port, () => {
  console.log(`Tunnelwright API listening on port ${config.port} (public URL ${config.publicUrl}${config.demoMode ? ', demo mode' : ''})`);
});

function shutdown(signal: string): void {
  console.log(`${signal} received, closing`);
  server.close(() => {
    mailer.close();
    Promise.allSettled([knex.destroy(), redis.quit()]).then(() => process.exit(0));
  });
  // Connections kept alive by browsers must not hold the process forever.
  setTimeout(() => process.exit(0), 10_000).unref();
}
process.on('SIGTERM', () => shutdown('SIGTERM'));
process.on('SIGINT', () => shutdown('SIGINT'));
