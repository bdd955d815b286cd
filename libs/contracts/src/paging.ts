import { z } from 'zod';

/** A page of a list: `items` plus the total count for the paginator. */
export function pageSchema<T extends z.ZodType>(item: T) {
  return z.object({ items: z.array(item), total: z.number().int() });
}
export interface Page<T> {
  items: T[];
  total: number;
}
