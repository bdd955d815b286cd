import { bookingSettingsSchema, defaultBookingSettings, type BookingSettings } from '@tunnelwright/contracts';
import { Organisation } from '@tunnelwright/db';
import type { Knex } from 'knex';

/** The lab's zone and booking rules, as kept in the lab organisation's settings (`settings.booking`). */
export interface LabBookingContext {
  lab: Organisation;
  timeZone: string;
  rules: BookingSettings;
}

/** Reads the lab's booking rules, falling back to the defaults (48 h holds; 50 % within 7 days) for anything unset. */
export async function loadLabBookingContext(knex: Knex): Promise<LabBookingContext> {
  const lab = await Organisation.query(knex).findOne({ kind: 'lab' });
  if (!lab) throw new Error('loadLabBookingContext requires the lab organisation to exist');
  const stored = bookingSettingsSchema.partial().safeParse(lab.settings['booking'] ?? {});
  return { lab, timeZone: lab.timeZone ?? 'UTC', rules: { ...defaultBookingSettings, ...(stored.success ? stored.data : {}) } };
}
