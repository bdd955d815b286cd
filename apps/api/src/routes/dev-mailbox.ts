import { readMailbox } from '../mail/mailbox';
import { route, type RouteDef } from './route';

/** /api/dev/mailbox: what the local SMTP fake received. Exists only in demo mode. */
export const devMailboxRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/mailbox',
    access: ['lab_manager'],
    summary: 'Mail caught by the local SMTP fake (demo mode only)',
    enabled: (config) => config.demoMode,
    sample: { expect: 200 },
    handler: async ({ res, deps }) => {
      res.json(await readMailbox(deps.config.mailDir));
    },
  }),
];
