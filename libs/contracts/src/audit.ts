import { z } from 'zod';

export const auditEntrySchema = z.object({
  id: z.uuid(),
  actorId: z.uuid().nullable(),
  actorName: z.string().nullable(),
  action: z.string(),
  entity: z.string(),
  entityId: z.string().nullable(),
  before: z.unknown().nullable(),
  after: z.unknown().nullable(),
  createdAt: z.iso.datetime(),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

/** GET /api/audit query: filter by entity (and record), 1-based paging, newest first. */
export const auditListQuerySchema = z.object({
  entity: z.string().trim().max(60).optional(),
  entityId: z.string().trim().max(60).optional(),
  page: z.coerce.number().int().min(1, { message: 'Pages count from 1' }).default(1),
  pageSize: z.coerce.number().int().min(1).max(200, { message: 'At most 200 per page' }).default(50),
});
export type AuditListQuery = z.infer<typeof auditListQuerySchema>;
