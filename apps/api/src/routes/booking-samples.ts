import { randomUUID } from 'node:crypto';
import type { BookingState } from '@tunnelwright/contracts';
import { Booking, MaintenanceBlock, Organisation, Quote, QuoteLine, User } from '@tunnelwright/db';
import { rangeLiteral } from '../bookings/periods';
import type { SampleFixtures } from './route';

/**
 * Records the role × route matrix needs for the booking routes, made through the models (bound to the
 * app's database). Each booking is on a fresh tunnel, so samples never clash, and belongs to the matrix
 * customer's organisation.
 */

const day = 86_400_000;

/** A period `daysAhead` days from now, lasting `hours` hours. */
export function samplePeriod(daysAhead: number, hours = 8) {
  const start = new Date(Math.ceil((Date.now() + daysAhead * day) / 3_600_000) * 3_600_000);
  return { start: start.toISOString(), end: new Date(start.getTime() + hours * 3_600_000).toISOString() };
}

/** A request body for a fresh tunnel. */
export async function sampleBookingRequest(f: SampleFixtures) {
  return { tunnelId: await f.tunnelId(), ...samplePeriod(60), articles: [{ name: `Matrix article ${f.unique()}`, referenceAreaKind: 'frontal' }], testPlan: { speeds: [20, 30], yawRange: { from: -10, to: 10, step: 5 } } };
}

async function labUserId(f: SampleFixtures, role: 'lab_manager' | 'technician'): Promise<string> {
  const lab = await Organisation.query().findOne({ kind: 'lab' });
  if (!lab) throw new Error('the matrix needs the lab organisation');
  const user = await User.query().insert({ email: `booking-sample-${f.unique()}@example.com`, name: `Sample ${role}`, role, organisationId: lab.id, passwordHash: null, active: true });
  return user.id;
}

/** A booking in `state` (with an offered or accepted quote where the state has one), 60 days ahead. */
export async function sampleBookingId(f: SampleFixtures, state: BookingState = 'requested'): Promise<string> {
  const customer = await f.customerUser();
  const period = samplePeriod(60);
  const booking = await Booking.query().insert({
    organisationId: await f.customerOrganisationId(),
    tunnelId: await f.tunnelId(),
    serviceId: null,
    requestedBy: customer.id,
    period: rangeLiteral({ start: new Date(period.start), end: new Date(period.end) }),
    counterPeriod: state === 'counter_proposed' ? rangeLiteral({ start: new Date(Date.parse(period.start) + 7 * day), end: new Date(Date.parse(period.end) + 7 * day) }) : null,
    state,
    holdExpiresAt: ['requested', 'quoted', 'counter_proposed'].includes(state) ? new Date(Date.now() + 2 * day) : null,
    testPlan: { speeds: [25], yawRange: null, configurations: [] },
    articles: [{ name: 'Matrix article', description: '', referenceAreaKind: 'frontal' }],
    customerNote: '',
    icsUid: `${randomUUID()}@tunnelwright.invalid`,
    icsSequence: 0,
  });
  if (['quoted', 'confirmed', 'in_test', 'completed'].includes(state)) {
    const quote = await Quote.query().insert({ bookingId: booking.id, state: state === 'quoted' ? 'offered' : 'accepted', currency: 'GBP', totalMinor: 120000, note: '', createdBy: await labUserId(f, 'lab_manager') });
    await QuoteLine.query().insert({ quoteId: quote.id, position: 1, kind: 'tunnel_hours', description: 'Tunnel time', quantity: 8, unitPriceMinor: 15000, lineTotalMinor: 120000 });
  }
  return booking.id;
}

/** A technician body for the assignment route. */
export async function sampleTechnicianBody(f: SampleFixtures) {
  return { technicianId: await labUserId(f, 'technician') };
}

/** A maintenance block body on a fresh tunnel. */
export async function sampleMaintenanceBody(f: SampleFixtures) {
  return { tunnelId: await f.tunnelId(), ...samplePeriod(30, 24), reason: 'Fan bearing inspection' };
}

export async function sampleMaintenanceBlockId(f: SampleFixtures): Promise<string> {
  const body = await sampleMaintenanceBody(f);
  const block = await MaintenanceBlock.query().insert({ tunnelId: body.tunnelId, period: rangeLiteral({ start: new Date(body.start), end: new Date(body.end) }), reason: body.reason, createdBy: await labUserId(f, 'lab_manager') });
  return block.id;
}
