import { z } from 'zod';
import { referenceAreaKindSchema } from './ingest';

/**
 * Bookings of tunnel time, quotes, cancellations, maintenance blocks and the occupancy calendar.
 * Times are ISO 8601; answers are UTC (`…Z`) and carry the lab's IANA zone for display. A period is
 * half-open: it starts at `start` and ends just before `end`, so back-to-back periods do not clash.
 * Money is integer minor units (e.g. pence) with an ISO 4217 currency code. Speeds m/s, angles degrees.
 */

/**
 * Life cycle: requested → quoted → confirmed → in_test → completed. The lab may instead decline or
 * counter-propose another period (the customer accepts it → requested again); the customer may reject a
 * quote. Either side may cancel before the test starts. A provisional hold (requested, quoted,
 * counter_proposed) that nobody answers in time becomes expired and frees its slot.
 */
export const bookingStates = ['requested', 'quoted', 'counter_proposed', 'confirmed', 'in_test', 'completed', 'declined', 'rejected', 'cancelled', 'expired'] as const;
export const bookingStateSchema = z.enum(bookingStates);
export type BookingState = z.infer<typeof bookingStateSchema>;

/** States in which a booking keeps its slot on the tunnel. */
export const slotHoldingStates: readonly BookingState[] = ['requested', 'quoted', 'counter_proposed', 'confirmed', 'in_test'];
/** States whose hold lapses at `holdExpiresAt`. */
export const provisionalStates: readonly BookingState[] = ['requested', 'quoted', 'counter_proposed'];
/**
 * States in which drawings and photos can still be added: the booking is open. A provisional booking whose
 * hold has lapsed is closed, even before the sweep marks it expired.
 */
export const attachableStates: readonly BookingState[] = [...provisionalStates, 'confirmed', 'in_test'];

/** Whether files can be added to a booking in `state` with hold `holdExpiresAt` at `now`. */
export function acceptsAttachments(booking: { state: BookingState; holdExpiresAt: Date | string | null }, now: Date = new Date()): boolean {
  if (!attachableStates.includes(booking.state)) return false;
  if (!provisionalStates.includes(booking.state) || booking.holdExpiresAt === null) return true;
  return new Date(booking.holdExpiresAt).getTime() > now.getTime();
}

export const quoteStateSchema = z.enum(['offered', 'accepted', 'rejected', 'withdrawn']);
export type QuoteState = z.infer<typeof quoteStateSchema>;

export const quoteLineKindSchema = z.enum(['tunnel_hours', 'setup', 'staff', 'extra']);
export type QuoteLineKind = z.infer<typeof quoteLineKindSchema>;

const text = (max: number) => z.string().trim().max(max);
const instant = (what: string) => z.iso.datetime({ offset: true, message: `${what} must be an ISO 8601 date and time with a zone offset, e.g. 2026-10-24T09:00:00+01:00` });

/** A period as sent by a client: any offset; `end` must come after `start`. */
export const periodInputSchema = z
  .object({ start: instant('Start'), end: instant('End') })
  .refine((p) => Date.parse(p.end) > Date.parse(p.start), { message: 'The end must be after the start', path: ['end'] });
export type PeriodInput = z.infer<typeof periodInputSchema>;

/** A period as answered: UTC instants, plus its length in hours (a day across a clock change is 23 or 25 h). */
export const periodSchema = z.object({ start: z.iso.datetime(), end: z.iso.datetime(), hours: z.number() });
export type Period = z.infer<typeof periodSchema>;

/** What the customer means to run. */
export const testPlanSchema = z.object({
  /** Test speeds, m/s. */
  speeds: z.array(z.number({ message: 'Speeds must be numbers' }).finite().positive({ message: 'Speeds must be greater than zero' })).max(50).default([]),
  /** Yaw sweep, degrees. */
  yawRange: z
    .object({ from: z.number().finite().min(-180).max(180), to: z.number().finite().min(-180).max(180), step: z.number().finite().positive().optional() })
    .refine((y) => y.to >= y.from, { message: 'The yaw range must end at or after its start', path: ['to'] })
    .nullable()
    .default(null),
  /** Named model configurations to run. */
  configurations: z.array(z.object({ label: text(120).min(1, { message: 'Name the configuration' }), description: text(2000).default('') })).max(50).default([]),
});
export type TestPlan = z.infer<typeof testPlanSchema>;

/** An article the customer will bring, with the reference area they want coefficients based on. */
export const bookingArticleSchema = z.object({
  name: text(120).min(1, { message: 'Name the article' }),
  description: text(2000).default(''),
  referenceAreaKind: referenceAreaKindSchema,
});
export type BookingArticle = z.infer<typeof bookingArticleSchema>;

/** POST /api/bookings (customer). */
export const bookingRequestSchema = periodInputSchema.safeExtend({
  tunnelId: z.uuid({ message: 'Choose a tunnel' }),
  serviceId: z.uuid({ message: 'Choose a service' }).nullable().default(null),
  testPlan: testPlanSchema.default({ speeds: [], yawRange: null, configurations: [] }),
  articles: z.array(bookingArticleSchema).min(1, { message: 'Name at least one article' }).max(20),
  note: text(4000).default(''),
  /** A saved test plan of the customer's organisation to attach; the plan then names this booking. */
  planId: z.uuid({ message: 'Choose one of your saved plans' }).optional(),
});
export type BookingRequest = z.infer<typeof bookingRequestSchema>;

export const quoteLineInputSchema = z.object({
  kind: quoteLineKindSchema,
  description: text(500).default(''),
  quantity: z.number({ message: 'Quantity must be a number' }).int({ message: 'Quantity must be a whole number' }).positive({ message: 'Quantity must be at least 1' }).max(10_000),
  /** Price of one unit, minor units. */
  unitPriceMinor: z.number({ message: 'Unit price must be a number' }).int({ message: 'Unit price must be whole minor units' }).min(0, { message: 'Unit price cannot be negative' }).max(1_000_000_000),
});
export type QuoteLineInput = z.infer<typeof quoteLineInputSchema>;

/** POST /api/bookings/:id/quote (lab manager). Currency defaults to the service's, else the lab's. */
export const quoteInputSchema = z.object({
  lines: z.array(quoteLineInputSchema).min(1, { message: 'A quote needs at least one line' }).max(100),
  currency: z.string().regex(/^[A-Z]{3}$/, { message: 'Use a three-letter currency code' }).optional(),
  note: text(4000).default(''),
});
export type QuoteInput = z.infer<typeof quoteInputSchema>;

export const quoteLineSchema = quoteLineInputSchema.extend({ position: z.number().int(), lineTotalMinor: z.number().int() });
export const quoteSchema = z.object({
  id: z.uuid(),
  state: quoteStateSchema,
  currency: z.string(),
  totalMinor: z.number().int(),
  note: z.string(),
  lines: z.array(quoteLineSchema),
  createdAt: z.iso.datetime(),
});
export type Quote = z.infer<typeof quoteSchema>;

/** POST /api/bookings/:id/decline (lab manager). */
export const declineBookingSchema = z.object({ reason: text(2000).min(1, { message: 'Say why the request is declined' }) });
/** POST /api/bookings/:id/counter-proposal (lab manager): another period the lab can offer. */
export const counterProposalSchema = periodInputSchema.safeExtend({ note: text(2000).default('') });
/** POST /api/bookings/:id/reschedule (lab manager): move a confirmed booking; the customer gets an updated invitation. */
export const rescheduleBookingSchema = periodInputSchema.safeExtend({ note: text(2000).default('') });
/** POST /api/bookings/:id/cancel. `expectedFeeMinor` (from the preview) makes the call fail with 409 if the fee changed meanwhile. */
export const cancelBookingSchema = z.object({
  reason: text(2000).min(1, { message: 'Say why the booking is cancelled' }),
  expectedFeeMinor: z.number().int().min(0).optional(),
});
/** POST /api/bookings/:id/technician (lab manager); null unassigns. */
export const assignTechnicianSchema = z.object({ technicianId: z.uuid({ message: 'Choose a technician' }).nullable() });
/** POST /api/bookings/:id/start (lab manager): optionally link the test record that holds the runs. */
export const startBookingSchema = z.object({ testId: z.uuid().optional() });
export const emptyBodySchema = z.object({}).strict();

export const bookingAttachmentSchema = z.object({
  id: z.uuid(),
  filename: z.string(),
  contentType: z.string(),
  sizeBytes: z.number().int(),
  sha256: z.string(),
  createdAt: z.iso.datetime(),
});
export type BookingAttachment = z.infer<typeof bookingAttachmentSchema>;

export const bookingSchema = z.object({
  id: z.uuid(),
  organisationId: z.uuid(),
  organisationName: z.string(),
  tunnelId: z.uuid(),
  tunnelName: z.string(),
  serviceId: z.uuid().nullable(),
  requestedBy: z.object({ id: z.uuid(), name: z.string() }),
  period: periodSchema,
  state: bookingStateSchema,
  holdExpiresAt: z.iso.datetime().nullable(),
  technician: z.object({ id: z.uuid(), name: z.string() }).nullable(),
  testPlan: testPlanSchema,
  articles: z.array(bookingArticleSchema),
  note: z.string(),
  declineReason: z.string().nullable(),
  counterProposal: z.object({ period: periodSchema, note: z.string() }).nullable(),
  cancellation: z.object({ at: z.iso.datetime(), byId: z.uuid().nullable(), reason: z.string(), feeMinor: z.number().int(), currency: z.string().nullable() }).nullable(),
  /** The live (offered or accepted) quote, if any. */
  quote: quoteSchema.nullable(),
  attachments: z.array(bookingAttachmentSchema),
  testId: z.uuid().nullable(),
  /** The lab's IANA zone, for display. */
  timeZone: z.string(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
});
export type Booking = z.infer<typeof bookingSchema>;

/** GET /api/bookings query. Customers only ever get their own organisation's bookings. */
export const bookingListQuerySchema = z.object({
  state: bookingStateSchema.optional(),
  tunnelId: z.uuid().optional(),
});
export type BookingListQuery = z.infer<typeof bookingListQuerySchema>;

/** GET /api/bookings/:id/cancellation-preview: what cancelling now would cost. */
export const cancellationPreviewSchema = z.object({
  bookingId: z.uuid(),
  /** Whether the late-cancellation rule applies now. */
  late: z.boolean(),
  feeMinor: z.number().int(),
  currency: z.string().nullable(),
  /** Quote total the fee is a share of (0 when there is no accepted quote). */
  quoteTotalMinor: z.number().int(),
  rule: z.object({ withinDays: z.number().int(), percent: z.number().int() }),
  explanation: z.string(),
  timeZone: z.string(),
});
export type CancellationPreview = z.infer<typeof cancellationPreviewSchema>;

/** The lab's booking rules: hold length and the late-cancellation rule. */
export const bookingSettingsSchema = z.object({
  /** How long a provisional hold keeps its slot, hours. */
  holdHours: z.number().int().min(1, { message: 'A hold lasts at least one hour' }).max(24 * 60),
  /** Cancelling within this many days of the start costs `lateCancellationPercent` % of the accepted quote. */
  lateCancellationDays: z.number().int().min(0).max(365),
  lateCancellationPercent: z.number().int().min(0).max(100),
});
export type BookingSettings = z.infer<typeof bookingSettingsSchema>;
export const defaultBookingSettings: BookingSettings = { holdHours: 48, lateCancellationDays: 7, lateCancellationPercent: 50 };

/** GET /api/tunnels/:id/occupancy query: the window to show, at most 400 days. */
export const occupancyWindowSchema = z
  .object({ from: instant('from'), to: instant('to') })
  .refine((w) => Date.parse(w.to) > Date.parse(w.from), { message: '`to` must be after `from`', path: ['to'] })
  .refine((w) => Date.parse(w.to) - Date.parse(w.from) <= 400 * 86_400_000, { message: 'Ask for at most 400 days at a time', path: ['to'] });
export type OccupancyWindow = z.infer<typeof occupancyWindowSchema>;

/**
 * One stretch of the calendar. `busy` stretches of other customers carry nothing but the period; the
 * caller's own bookings (and, for staff, every booking) carry the booking id, state and organisation.
 */
export const occupancySlotSchema = z.object({
  status: z.enum(['busy', 'free']),
  period: periodSchema,
  /** Why it is busy, when the caller may know: a booking or maintenance. */
  kind: z.enum(['booking', 'maintenance']).optional(),
  bookingId: z.uuid().optional(),
  state: bookingStateSchema.optional(),
  organisationName: z.string().optional(),
  reason: z.string().optional(),
});
export type OccupancySlot = z.infer<typeof occupancySlotSchema>;
export const occupancySchema = z.object({ tunnelId: z.uuid(), timeZone: z.string(), from: z.iso.datetime(), to: z.iso.datetime(), slots: z.array(occupancySlotSchema) });
export type Occupancy = z.infer<typeof occupancySchema>;

/** POST /api/maintenance-blocks (lab manager). */
export const maintenanceBlockInputSchema = periodInputSchema.safeExtend({
  tunnelId: z.uuid({ message: 'Choose a tunnel' }),
  reason: text(2000).min(1, { message: 'Say what the maintenance is' }),
});
export const maintenanceBlockSchema = z.object({ id: z.uuid(), tunnelId: z.uuid(), period: periodSchema, reason: z.string(), timeZone: z.string(), createdAt: z.iso.datetime() });
export type MaintenanceBlock = z.infer<typeof maintenanceBlockSchema>;
export const maintenanceListQuerySchema = z.object({ tunnelId: z.uuid().optional() });
