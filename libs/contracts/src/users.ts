import { z } from 'zod';
import { emailSchema } from './auth';
import { roles, roleSchema } from './roles';

export const organisationKindSchema = z.enum(['lab', 'customer']);
export type OrganisationKind = z.infer<typeof organisationKindSchema>;

export const organisationSchema = z.object({
  id: z.uuid(),
  name: z.string(),
  kind: organisationKindSchema,
});
export type Organisation = z.infer<typeof organisationSchema>;

export const userSummarySchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  organisationId: z.uuid(),
  organisationName: z.string(),
  active: z.boolean(),
  /** Whether the user has accepted an invitation and set a password. */
  activated: z.boolean(),
  createdAt: z.iso.datetime(),
});
export type UserSummary = z.infer<typeof userSummarySchema>;

/** POST /api/invitations (lab manager). Staff roles must be in the lab organisation, customers in a customer organisation. */
export const createInvitationSchema = z.object({
  email: emailSchema,
  name: z.string().trim().min(1, { message: 'Enter a name' }).max(120),
  role: roleSchema,
  organisationId: z.uuid({ message: 'Choose an organisation' }),
});
export type CreateInvitationRequest = z.infer<typeof createInvitationSchema>;

/** PATCH /api/users/:id (lab manager). */
export const updateUserSchema = z
  .object({
    role: roleSchema.optional(),
    active: z.boolean().optional(),
    name: z.string().trim().min(1).max(120).optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type UpdateUserRequest = z.infer<typeof updateUserSchema>;

/** PATCH /api/me — a user's own profile. */
export const updateProfileSchema = z.object({
  name: z.string().trim().min(1, { message: 'Enter a name' }).max(120),
});
export type UpdateProfileRequest = z.infer<typeof updateProfileSchema>;

/** Columns GET /api/users can sort by. */
export const userSortSchema = z.enum(['name', 'email', 'role', 'createdAt']);
export type UserSort = z.infer<typeof userSortSchema>;

/** GET /api/users query: free-text search on name and e-mail, optionally one role and only active accounts, sorting and 1-based paging. */
export const userListQuerySchema = z.object({
  q: z.string().trim().max(120).optional(),
  role: z.enum(roles, { message: `Role must be one of ${roles.join(', ')}` }).optional(),
  /** `true`: only accounts that may sign in; `false`: only deactivated ones; absent: both. */
  active: z.enum(['true', 'false'], { message: 'Active must be true or false' }).transform((v) => v === 'true').optional(),
  sort: userSortSchema.default('name'),
  order: z.enum(['asc', 'desc']).default('asc'),
  page: z.coerce.number({ message: 'Page must be a number' }).int().min(1, { message: 'Pages count from 1' }).default(1),
  pageSize: z.coerce.number({ message: 'Page size must be a number' }).int().min(1).max(100, { message: 'At most 100 per page' }).default(20),
});
export type UserListQuery = z.infer<typeof userListQuerySchema>;

/** POST /api/organisations (lab manager): a new customer organisation. */
export const createOrganisationSchema = z.object({
  name: z.string().trim().min(1, { message: 'Enter a name' }).max(200),
});
export type CreateOrganisationRequest = z.infer<typeof createOrganisationSchema>;
