import { z } from 'zod';

/** The four roles of Tunnelwright. Staff roles belong to the lab organisation; customers to their own. */
export const roles = ['customer', 'technician', 'analyst', 'lab_manager'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/** Roles that belong to the laboratory itself. */
export const staffRoles: readonly Role[] = ['technician', 'analyst', 'lab_manager'];

/** Human-readable names shown in the client. */
export const roleLabels: Record<Role, string> = {
  customer: 'Customer',
  technician: 'Technician',
  analyst: 'Analyst',
  lab_manager: 'Lab manager',
};
