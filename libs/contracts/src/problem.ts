import { z } from 'zod';

/**
 * RFC 9457 problem details, the body of every error response.
 * `errors` lists field-level failures for validation problems (status 400).
 */
export const fieldErrorSchema = z.object({
  /** Dotted path of the failing field, e.g. `email` or `lines.2.amount`. */
  field: z.string(),
  message: z.string(),
});
export type FieldError = z.infer<typeof fieldErrorSchema>;

export const problemSchema = z.object({
  type: z.string(),
  title: z.string(),
  status: z.number().int(),
  detail: z.string().optional(),
  instance: z.string().optional(),
  errors: z.array(fieldErrorSchema).optional(),
});
export type Problem = z.infer<typeof problemSchema>;
