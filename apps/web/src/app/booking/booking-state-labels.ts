import type { BookingState } from '@tunnelwright/contracts';

/** How each booking state reads to people. */
export const bookingStateLabels: Readonly<Record<BookingState, string>> = {
  requested: 'Requested',
  quoted: 'Quote to answer',
  counter_proposed: 'Other period offered',
  confirmed: 'Confirmed',
  in_test: 'In test',
  completed: 'Test completed',
  declined: 'Declined',
  rejected: 'Quote rejected',
  cancelled: 'Cancelled',
  expired: 'Hold lapsed',
};
