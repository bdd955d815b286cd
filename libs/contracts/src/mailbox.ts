import { z } from 'zod';

/** GET /api/dev/mailbox — what the local SMTP fake received (demo mode only). */
export const mailSummarySchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  date: z.iso.datetime(),
  text: z.string(),
  /** Links found in the text part, so a newcomer can follow an invitation. */
  links: z.array(z.string()),
  attachments: z.array(z.object({ filename: z.string(), contentType: z.string(), size: z.number().int() })),
});
export type MailSummary = z.infer<typeof mailSummarySchema>;
