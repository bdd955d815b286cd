import type { BookingArticle, BookingState, QuoteLineKind, TestPlan } from '@tunnelwright/contracts';
import { Booking, MaintenanceBlock, Organisation, Quote, Tunnel, User } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { demoTunnels } from './catalogue';
import { demoCustomers, demoUsers } from './demo-users';

/**
 * Demo bookings in every state across the two invented customers, and one maintenance block.
 * Each booking is known by its stable calendar UID, so a second run finds it and changes nothing. Periods
 * are placed relative to the first run, one per day, so they never overlap.
 */

const hour = 3_600_000;
const day = 24 * hour;

interface DemoBooking {
  key: string;
  state: BookingState;
  customer: keyof typeof demoCustomers;
  tunnel: 0 | 1;
  /** Days from today (UTC midnight; negative: in the past) and the start hour, UTC. */
  dayOffset: number;
  startHour: number;
  hours: number;
  articles: BookingArticle[];
  testPlan: TestPlan;
  quote?: { kind: QuoteLineKind; description: string; quantity: number; unitPriceMinor: number }[];
  note?: string;
}

const deck: BookingArticle[] = [{ name: 'Footbridge deck section, 1:30', description: 'Sectional model on springs', referenceAreaKind: 'frontal' }];
const frame: BookingArticle[] = [{ name: 'Ground-mount solar table, 1:10', description: 'Two rows of panels at 25° tilt', referenceAreaKind: 'planform' }];
const sweep: TestPlan = { speeds: [10, 15, 20], yawRange: { from: -30, to: 30, step: 10 }, configurations: [{ label: 'Bare deck', description: '' }, { label: 'With parapets', description: 'Solid parapets both sides' }] };
const tilt: TestPlan = { speeds: [12, 18, 24], yawRange: { from: 0, to: 180, step: 15 }, configurations: [{ label: 'Stow 0°', description: '' }, { label: 'Operating 25°', description: '' }] };
const dayBlock = [
  { kind: 'tunnel_hours' as const, description: 'Tunnel time', quantity: 8, unitPriceMinor: 33125 },
  { kind: 'setup' as const, description: 'Model set-up', quantity: 1, unitPriceMinor: 60000 },
];

const demoBookings: DemoBooking[] = [
  { key: 'requested', state: 'requested', customer: 'quillfen', tunnel: 0, dayOffset: 20, startHour: 8, hours: 8, articles: deck, testPlan: sweep, note: 'We can bring the model the day before.' },
  { key: 'quoted', state: 'quoted', customer: 'tarnwick', tunnel: 1, dayOffset: 22, startHour: 8, hours: 8, articles: frame, testPlan: tilt, quote: dayBlock },
  { key: 'counter-proposed', state: 'counter_proposed', customer: 'quillfen', tunnel: 1, dayOffset: 24, startHour: 8, hours: 4, articles: deck, testPlan: sweep },
  { key: 'confirmed', state: 'confirmed', customer: 'tarnwick', tunnel: 0, dayOffset: 12, startHour: 8, hours: 8, articles: frame, testPlan: tilt, quote: dayBlock },
  { key: 'in-test', state: 'in_test', customer: 'quillfen', tunnel: 0, dayOffset: 0, startHour: 0, hours: 24, articles: deck, testPlan: sweep, quote: dayBlock },
  { key: 'completed', state: 'completed', customer: 'tarnwick', tunnel: 1, dayOffset: -10, startHour: 8, hours: 8, articles: frame, testPlan: tilt, quote: dayBlock },
  { key: 'declined', state: 'declined', customer: 'tarnwick', tunnel: 0, dayOffset: 30, startHour: 8, hours: 8, articles: frame, testPlan: tilt },
  { key: 'rejected', state: 'rejected', customer: 'quillfen', tunnel: 1, dayOffset: 32, startHour: 8, hours: 8, articles: deck, testPlan: sweep, quote: dayBlock },
  { key: 'cancelled', state: 'cancelled', customer: 'quillfen', tunnel: 0, dayOffset: 34, startHour: 8, hours: 8, articles: deck, testPlan: sweep, quote: dayBlock },
  { key: 'expired', state: 'expired', customer: 'tarnwick', tunnel: 1, dayOffset: 36, startHour: 8, hours: 8, articles: frame, testPlan: tilt },
];

const uidOf = (key: string) => `demo-booking-${key}@brackenmoor.example`;
const range = (start: Date, end: Date) => `[${start.toISOString()},${end.toISOString()})`;
const maintenanceReason = 'Annual fan and turning-vane inspection';

/** Adds the demo bookings and maintenance block that are missing; names what it added in `created`. */
export async function seedBookings(trx: Knex.Transaction, created: string[]): Promise<void> {
  const lab = await Organisation.query(trx).findOne({ kind: 'lab' });
  const manager = await User.query(trx).findOne({ email: demoUsers.find((u) => u.role === 'lab_manager')?.email ?? '' });
  if (!lab || !manager) throw new Error('seedBookings requires the demo lab and its manager');
  const tunnels = await Promise.all(demoTunnels.map((t) => Tunnel.query(trx).findOne({ name: t.name })));
  const today = new Date(Math.floor(Date.now() / day) * day);

  for (const demo of demoBookings) {
    if (await Booking.query(trx).findOne({ icsUid: uidOf(demo.key) })) continue;
    const tunnel = tunnels[demo.tunnel];
    const organisation = await Organisation.query(trx).findOne({ name: demoCustomers[demo.customer] });
    const customer = demoUsers.find((u) => u.role === 'customer' && u.organisation === demoCustomers[demo.customer]);
    const requester = customer ? await User.query(trx).findOne({ email: customer.email }) : undefined;
    if (!tunnel || !organisation || !requester) throw new Error(`seedBookings cannot place the ${demo.key} booking: a demo tunnel, customer or user is missing`);
    const start = new Date(today.getTime() + demo.dayOffset * day + demo.startHour * hour);
    const end = new Date(start.getTime() + demo.hours * hour);
    const provisional = ['requested', 'quoted', 'counter_proposed'].includes(demo.state);
    const booking = await Booking.query(trx).insert({
      organisationId: organisation.id,
      tunnelId: tunnel.id,
      serviceId: null,
      requestedBy: requester.id,
      period: range(start, end),
      counterPeriod: demo.state === 'counter_proposed' ? range(new Date(start.getTime() + 2 * day), new Date(end.getTime() + 2 * day)) : null,
      counterNote: demo.state === 'counter_proposed' ? 'The open-jet hall is free two days later.' : null,
      state: demo.state,
      holdExpiresAt: provisional ? new Date(Date.now() + 48 * hour) : demo.state === 'expired' ? new Date(Date.now() - day) : null,
      technicianId: null,
      testPlan: demo.testPlan,
      articles: demo.articles,
      customerNote: demo.note ?? '',
      declineReason: demo.state === 'declined' ? 'The balance is away for its calibration that week.' : null,
      cancelledAt: demo.state === 'cancelled' ? new Date() : null,
      cancelledBy: demo.state === 'cancelled' ? requester.id : null,
      cancellationReason: demo.state === 'cancelled' ? 'The model will not be ready in time.' : null,
      cancellationFeeMinor: demo.state === 'cancelled' ? 0 : null,
      icsUid: uidOf(demo.key),
      icsSequence: demo.state === 'cancelled' ? 1 : 0,
    });
    if (demo.quote) {
      const lines = demo.quote.map((line, i) => ({ ...line, position: i + 1, lineTotalMinor: line.quantity * line.unitPriceMinor }));
      const quoteState = demo.state === 'quoted' ? 'offered' : demo.state === 'rejected' ? 'rejected' : demo.state === 'cancelled' ? 'withdrawn' : 'accepted';
      await Quote.query(trx).insertGraph({ bookingId: booking.id, state: quoteState, currency: 'GBP', totalMinor: lines.reduce((s, l) => s + l.lineTotalMinor, 0), note: '', createdBy: manager.id, lines });
    }
    created.push(`booking ${demo.key} (${demo.state})`);
  }

  const closedTunnel = tunnels[0];
  if (closedTunnel && !(await MaintenanceBlock.query(trx).findOne({ tunnelId: closedTunnel.id, reason: maintenanceReason }))) {
    const start = new Date(today.getTime() + 40 * day);
    await MaintenanceBlock.query(trx).insert({ tunnelId: closedTunnel.id, period: range(start, new Date(start.getTime() + 3 * day)), reason: maintenanceReason, createdBy: manager.id });
    created.push('maintenance block');
  }
}
