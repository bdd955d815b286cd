import { existsSync } from 'node:fs';
import { join } from 'node:path';
import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { Model } from 'objection';
import { pinoHttp } from 'pino-http';
import { createAuthenticate } from './auth/authenticate';
import type { AppDeps } from './deps';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { buildRouter } from './routes/build-router';
import { resources } from './routes/route-table';

/** Builds the Express app without listening, so tests can drive it with supertest. */
export function createApp(deps: AppDeps): Express {
  Model.knex(deps.knex);
  const app = express();
  app.disable('x-powered-by');
  if (deps.config.trustProxy !== undefined) {
    const hops = Number(deps.config.trustProxy);
    app.set('trust proxy', Number.isNaN(hops) ? deps.config.trustProxy : hops);
  }

  app.use(
    pinoHttp({
      level: deps.config.logLevel,
      redact: { paths: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'], censor: '[redacted]' },
      customLogLevel: (_req, res, error) => (error || res.statusCode >= 500 ? 'error' : res.statusCode >= 400 ? 'warn' : 'info'),
    }),
  );
  const https = deps.config.publicUrl.startsWith('https:');
  app.use(
    helmet({
      // Over plain http (local demo) HSTS and request upgrading would only break the page.
      strictTransportSecurity: https,
      contentSecurityPolicy: {
        directives: {
          'upgrade-insecure-requests': https ? [] : null,
          // Angular Material injects component styles at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:'],
          // The production build loads its stylesheet with onload="this.media='all'"; allow exactly that handler.
          'script-src-attr': ["'unsafe-hashes'", "'sha256-MhtPZXr7+LpJUY5qtMutB+qWfQtMaPccfe7QXtCcEYc='"],
        },
      },
    }),
  );
  app.use(express.json({ limit: '1mb' }));
  app.use(cookieParser());

  const authenticate = createAuthenticate(deps.config.jwtSecret);
  for (const resource of resources) {
    app.use(resource.mount, buildRouter(resource.routes, deps, authenticate));
  }
  app.use('/api', apiNotFound);

  const index = join(deps.config.webDist, 'index.html');
  app.use(express.static(deps.config.webDist, { index: false, maxAge: '1h' }));
  app.get('/{*splat}', (_req, res, next) => {
    if (!existsSync(index)) {
      next();
      return;
    }
    res.sendFile(index);
  });

  app.use(errorHandler);
  app.use((req, res) => {
    res.status(404).type('application/problem+json').json({
      type: 'https://tunnelwright.invalid/problems/not-found',
      title: 'Not found',
      status: 404,
      detail: existsSync(index) ? 'There is nothing at this address.' : 'The web client is not built yet. Run `npm run build:web`.',
      instance: req.originalUrl,
    });
  });
  return app;
}
