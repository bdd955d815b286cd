import { articleRoutes } from './articles';
import { auditRoutes } from './audit';
import { balanceRoutes } from './balances';
import { bookingAttachmentRoutes } from './booking-attachments';
import { bookingRoutes } from './bookings';
import { authRoutes } from './auth';
import { devMailboxRoutes } from './dev-mailbox';
import { healthRoutes } from './health';
import { importProfileRoutes } from './import-profiles';
import { invitationRoutes } from './invitations';
import { maintenanceBlockRoutes } from './maintenance-blocks';
import { meRoutes } from './me';
import { occupancyRoutes } from './occupancy';
import { organisationRoutes } from './organisations';
import { planRoutes } from './plans';
import { pointExclusionRoutes } from './point-exclusions';
import { reductionRoutes } from './reductions';
import { resultSheetRoutes } from './result-sheets';
import { reviewRoutes } from './review';
import type { Resource, RouteDef } from './route';
import { runRoutes } from './runs';
import { serviceRoutes } from './services';
import { shapeRoutes } from './shapes';
import { mySigningRightRoute, signingRightRoutes } from './signing-rights';
import { submissionRoutes, testSubmissionRoutes } from './submissions';
import { testRoutes } from './tests';
import { tunnelRoutes } from './tunnels';
import { userRoutes } from './users';
import { verifyRoutes } from './verify';

/**
 * Every route of the API, declared once. `app.ts` mounts one Router per resource built from this table,
 * and the integration tests generate the role × route matrix from it, so a new route is covered at once.
 */
export const resources: Resource[] = [
  { mount: '/api/health', routes: healthRoutes },
  { mount: '/api/auth', routes: authRoutes },
  { mount: '/api/me', routes: meRoutes },
  { mount: '/api/me', routes: [mySigningRightRoute] },
  { mount: '/api/organisations', routes: organisationRoutes },
  { mount: '/api/users', routes: userRoutes },
  { mount: '/api/invitations', routes: invitationRoutes },
  { mount: '/api/tunnels', routes: tunnelRoutes },
  { mount: '/api/tunnels', routes: occupancyRoutes },
  { mount: '/api/services', routes: serviceRoutes },
  { mount: '/api/audit', routes: auditRoutes },
  { mount: '/api/dev', routes: devMailboxRoutes },
  { mount: '/api/articles', routes: articleRoutes },
  { mount: '/api/balances', routes: balanceRoutes },
  { mount: '/api/tests', routes: testRoutes },
  { mount: '/api/import-profiles', routes: importProfileRoutes },
  { mount: '/api/runs', routes: runRoutes },
  { mount: '/api/reductions', routes: reductionRoutes },
  { mount: '/api/reductions', routes: pointExclusionRoutes },
  { mount: '/api/tests', routes: testSubmissionRoutes },
  { mount: '/api/submissions', routes: submissionRoutes },
  { mount: '/api/signing-rights', routes: signingRightRoutes },
  { mount: '/api/result-sheets', routes: resultSheetRoutes },
  { mount: '/api/verify', routes: verifyRoutes },
  { mount: '/api/review', routes: reviewRoutes },
  { mount: '/api/shapes', routes: shapeRoutes },
  { mount: '/api/plans', routes: planRoutes },
  { mount: '/api/bookings', routes: bookingRoutes },
  { mount: '/api/bookings', routes: bookingAttachmentRoutes },
  { mount: '/api/maintenance-blocks', routes: maintenanceBlockRoutes },
];

/** One row per route with its full path, as the test matrix reads it. */
export const routeTable: (RouteDef & { fullPath: string })[] = resources.flatMap((resource) =>
  resource.routes.map((r) => ({ ...r, fullPath: `${resource.mount}${r.path === '/' ? '' : r.path}` })),
);
