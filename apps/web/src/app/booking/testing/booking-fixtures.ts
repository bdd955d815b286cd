import type { Booking } from '@tunnelwright/contracts';

/** The id of `bookingFixture()`, for the addresses a spec expects the page to call. */
export const fixtureBookingId = '9e8d7c6b-5a4f-4e3d-8c2b-1a0f9e8d7c6b';

/**
 * A confirmed eight-hour booking of an invented customer in an invented tunnel, with no technician, quote or
 * attachments; `overrides` replace whole fields.
 */
export function bookingFixture(overrides: Partial<Booking> = {}): Booking {
  return {
    id: fixtureBookingId,
    organisationId: '2a3b4c5d-6e7f-4a8b-9c0d-1e2f3a4b5c6d',
    organisationName: 'Northfield Models',
    tunnelId: '3f1c2b4a-5d6e-4f70-8a9b-0c1d2e3f4a5b',
    tunnelName: 'Low-speed circuit',
    serviceId: null,
    requestedBy: { id: '4b5c6d7e-8f90-4a1b-8c2d-3e4f5a6b7c8d', name: 'Ida Marsh' },
    period: { start: '2030-10-07T08:00:00.000Z', end: '2030-10-07T16:00:00.000Z', hours: 8 },
    state: 'confirmed',
    holdExpiresAt: null,
    technician: null,
    testPlan: { speeds: [20], yawRange: null, configurations: [] },
    articles: [{ name: 'Hatchback model, 1:4', description: '', referenceAreaKind: 'frontal' }],
    note: '',
    declineReason: null,
    counterProposal: null,
    cancellation: null,
    quote: null,
    attachments: [],
    testId: null,
    timeZone: 'Europe/London',
    createdAt: '2030-09-01T09:00:00.000Z',
    updatedAt: '2030-09-01T09:00:00.000Z',
    ...overrides,
  };
}
