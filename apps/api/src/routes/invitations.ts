import { createInvitationSchema } from '@tunnelwright/contracts';
import { Organisation, recordAudit, User } from '@tunnelwright/db';
import { createLinkToken, invitationValidHours } from '../auth/link-tokens';
import { HttpError } from '../errors/http-error';
import { invitationMail } from '../mail/messages';
import { toUserSummary } from './presenters';
import { route, type RouteDef } from './route';
import { assertRoleFitsOrganisation } from './users';

/** /api/invitations: the lab manager opens an account and mails a single-use link to set the password. */
export const invitationRoutes: RouteDef[] = [
  route({
    method: 'post',
    path: '/',
    access: ['lab_manager'],
    summary: 'Invite a person (creates the account, mails the link)',
    body: createInvitationSchema,
    sample: {
      body: async (f) => ({ email: `invitee-${f.unique()}@example.com`, name: 'Matrix Invitee', role: 'customer', organisationId: await f.customerOrganisationId() }),
      expect: 201,
    },
    handler: async ({ caller, body, res, deps }) => {
      const summary = await deps.knex.transaction(async (trx) => {
        const organisation = await Organisation.query(trx).findById(body.organisationId);
        if (!organisation) throw HttpError.field('organisationId', 'Choose an existing organisation');
        assertRoleFitsOrganisation(body.role, organisation);
        const existing = await User.query(trx).findOne({ email: body.email }).forUpdate();
        if (existing?.passwordHash) throw new HttpError(409, 'Already has an account', 'This person already has an account.', [{ field: 'email', message: 'This e-mail address already has an account' }]);
        // Inviting someone who has not accepted yet sends a fresh link with the new details.
        const user = existing
          ? await User.query(trx).patchAndFetchById(existing.id, { name: body.name, role: body.role, organisationId: organisation.id, active: true })
          : await User.query(trx).insert({ email: body.email, name: body.name, role: body.role, organisationId: organisation.id, passwordHash: null, active: true }).returning('*');
        user.organisation = organisation;
        const { token } = await createLinkToken(trx, user.id, 'invitation');
        const after = toUserSummary(user);
        await recordAudit(trx, { actorId: caller.id, action: existing ? 'user.reinvited' : 'user.invited', entity: 'user', entityId: user.id, after });
        // Mailed inside the transaction: if the mail cannot be sent, no half-made invitation stays behind.
        try {
          await deps.mailer.send(
            invitationMail({
              to: user.email,
              name: user.name,
              role: user.role,
              organisationName: organisation.name,
              inviterName: caller.name,
              link: `${deps.config.publicUrl}/accept-invitation?token=${encodeURIComponent(token)}`,
              validHours: invitationValidHours,
            }),
          );
        } catch {
          throw new HttpError(503, 'Mail not sent', 'The invitation e-mail could not be sent. Nothing was saved; please try again.');
        }
        return after;
      });
      res.status(201).json(summary);
    },
  }),
];
