import { z } from 'zod';

/**
 * Tunnels and services. All physical quantities are SI: metres, square metres, m/s, Pa/m.
 * Money is integer minor units with an ISO 4217 currency code.
 */
export const tunnelKindSchema = z.enum(['closed', 'open_jet']);
export type TunnelKind = z.infer<typeof tunnelKindSchema>;

const positive = (what: string) => z.number({ message: `${what} must be a number` }).positive({ message: `${what} must be greater than zero` });

/** Per-facility open-jet correction constants (see the reduction engine's configuration docs). */
export const openJetConstantsSchema = z.record(z.string(), z.number());

export const tunnelInputSchema = z.object({
  name: z.string().trim().min(1, { message: 'Enter a name' }).max(120),
  kind: tunnelKindSchema,
  description: z.string().trim().max(2000).default(''),
  /** Test-section (or nozzle) width, m. */
  width: positive('Width'),
  /** Test-section (or nozzle) height, m. */
  height: positive('Height'),
  /** Cross-section area C, m²; may differ from width × height for corner fillets. */
  area: positive('Area'),
  /** Test-section length, m. */
  length: positive('Length'),
  /** Minimum and maximum speed, m/s. */
  minSpeed: z.number().min(0, { message: 'Minimum speed cannot be negative' }).default(0),
  maxSpeed: positive('Maximum speed'),
  /** Empty-section static-pressure gradient dp/dx, Pa/m (usually ≤ 0). */
  pressureGradient: z.number().default(0),
  /** Tunnel-shape factor τ1 for solid blockage (BRP ch. 10). */
  shapeFactor: positive('Shape factor τ1').default(0.86),
  openJetConstants: openJetConstantsSchema.default({}),
  /** Capability flags shown in the catalogue, e.g. turntable yaw range. */
  capabilities: z
    .object({
      yawRange: z.number().min(0).max(360).optional(),
      groundSimulation: z.boolean().optional(),
      turbulenceIntensity: z.number().min(0).optional(),
    })
    .default({}),
});
export type TunnelInput = z.infer<typeof tunnelInputSchema>;

/** A balance installed in a tunnel, as the catalogue shows it: Fx, Fy, Fz in N and Mx, My, Mz in N·m. */
export const installedBalanceSchema = z.object({ identifier: z.string(), capacities: z.array(z.number()).length(6) });
export type InstalledBalance = z.infer<typeof installedBalanceSchema>;

export const tunnelSchema = tunnelInputSchema.extend({
  id: z.uuid(),
  /** The balances installed in the tunnel, by identifier. */
  balances: z.array(installedBalanceSchema),
  archived: z.boolean(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type Tunnel = z.infer<typeof tunnelSchema>;

export const serviceUnitSchema = z.enum(['hour', 'half_day', 'day', 'item']);
export type ServiceUnit = z.infer<typeof serviceUnitSchema>;

export const serviceInputSchema = z.object({
  name: z.string().trim().min(1, { message: 'Enter a name' }).max(120),
  description: z.string().trim().max(2000).default(''),
  unit: serviceUnitSchema,
  /** Price per unit in minor units (e.g. cents). */
  rate: z.number().int({ message: 'Rate must be whole minor units' }).min(0, { message: 'Rate cannot be negative' }),
  currency: z.string().regex(/^[A-Z]{3}$/, { message: 'Use a three-letter currency code' }).default('EUR'),
  /** Optional tunnel this service is tied to; null means any tunnel. */
  tunnelId: z.uuid().nullable().default(null),
});
export type ServiceInput = z.infer<typeof serviceInputSchema>;

export const serviceSchema = serviceInputSchema.extend({
  id: z.uuid(),
  archived: z.boolean(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type Service = z.infer<typeof serviceSchema>;

/** GET /api/tunnels and /api/services query; archived records are listed for staff only. */
export const catalogueListQuerySchema = z.object({
  includeArchived: z
    .enum(['true', 'false'], { message: 'includeArchived is true or false' })
    .optional()
    .transform((v) => v === 'true'),
});
export type CatalogueListQuery = z.infer<typeof catalogueListQuerySchema>;
