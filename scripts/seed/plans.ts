import type { Knex } from 'knex';
import { planInputSchema, type PlanInputDraft } from '@tunnelwright/contracts';
import { Organisation, Plan, PlanVersion, Tunnel, User } from '@tunnelwright/db';
import { demoCustomers, demoUsers } from './demo-users';

interface DemoPlan {
  name: string;
  organisation: string;
  tunnel: string;
  /** The plan input without its tunnel, which is looked up by name. */
  input: Omit<PlanInputDraft, 'tunnelId'>;
}

/** Three invented plans against the closed-section tunnel: two for Quillfen (one later compared with its certified estate-car test), one for Tarnwick. */
export const demoPlans: DemoPlan[] = [
  {
    name: 'Inspection trolley with rider',
    organisation: demoCustomers.quillfen,
    tunnel: 'Tunnel 1 — closed section',
    input: {
      parts: [
        { type: 'shape', shapeId: 'rider-upright', dimensions: {}, count: 1, label: 'Rider, upright' },
        { type: 'shape', shapeId: 'circular-cylinder-cross-flow', dimensions: { length: 1.1, diameter: 0.05 }, count: 4, label: 'Frame uprights' },
        { type: 'custom', label: 'Tool box', dragArea: 0.12, frontalArea: 0.14, count: 1 },
      ],
      speeds: [15, 25, 35],
      scale: 0.5,
      dragCapacity: 400,
      yawMargin: 0.25,
      interferenceFactor: 1.1,
      fullScale: { groundSpeed: 6, windSpeed: 4, windDirection: 0, seriesMaxWind: 5 },
      duration: { points: 90, dwellSeconds: 30, configurationChanges: 3, changeMinutes: 20, setupMinutes: 90 },
    },
  },
  {
    name: 'Estate car, full-size estimate',
    organisation: demoCustomers.quillfen,
    tunnel: 'Tunnel 1 — closed section',
    input: {
      parts: [
        { type: 'custom', label: 'Body, smooth underfloor', dragArea: 0.55, frontalArea: 2.2, count: 1 },
        { type: 'custom', label: 'Door mirror', dragArea: 0.015, frontalArea: 0.04, count: 2 },
        { type: 'custom', label: 'Wheel and arch', dragArea: 0.012, frontalArea: 0.09, count: 4 },
      ],
      speeds: [30, 40, 50],
      scale: 0.25,
      dragCapacity: 400,
      yawMargin: 0.25,
      interferenceFactor: 1,
      fullScale: { groundSpeed: 30, windSpeed: 3, windDirection: 0, seriesMaxWind: 8 },
      duration: { points: 60, dwellSeconds: 30, configurationChanges: 2, changeMinutes: 20, setupMinutes: 90 },
    },
  },
  {
    name: 'Solar frame on a transport trailer',
    organisation: demoCustomers.tarnwick,
    tunnel: 'Tunnel 1 — closed section',
    input: {
      parts: [
        { type: 'shape', shapeId: 'square-plate-normal', dimensions: { side: 1.6 }, count: 1, label: 'Panel, face on' },
        { type: 'shape', shapeId: 'circular-cylinder-cross-flow', dimensions: { length: 0.9, diameter: 0.06 }, count: 4, label: 'Frame legs' },
        { type: 'shape', shapeId: 'cube-flat-on', dimensions: { side: 0.4 }, count: 1, label: 'Inverter box' },
      ],
      speeds: [20, 30, 40],
      scale: 0.25,
      dragCapacity: 250,
      yawMargin: 0.3,
      interferenceFactor: 1.05,
      fullScale: { groundSpeed: 22, windSpeed: 6, windDirection: 30, seriesMaxWind: 15 },
      duration: { points: 120, dwellSeconds: 30, configurationChanges: 4, changeMinutes: 15, setupMinutes: 60 },
    },
  },
];

/** Adds the demo plans that are missing (found by organisation and name), each with its first version. */
export async function seedPlans(trx: Knex.Transaction, created: string[]): Promise<void> {
  for (const plan of demoPlans) {
    const organisation = await Organisation.query(trx).findOne({ name: plan.organisation });
    const author = demoUsers.find((person) => person.organisation === plan.organisation && person.role === 'customer');
    const user = author ? await User.query(trx).findOne({ email: author.email }) : undefined;
    const tunnel = await Tunnel.query(trx).findOne({ name: plan.tunnel });
    if (!organisation || !user || !tunnel) throw new Error(`Demo plan ${plan.name} names an unknown organisation, customer or tunnel`);
    if (await Plan.query(trx).findOne({ organisationId: organisation.id, name: plan.name })) continue;
    const input = planInputSchema.parse({ ...plan.input, tunnelId: tunnel.id });
    const inserted = await Plan.query(trx).insert({ organisationId: organisation.id, name: plan.name, currentVersion: 1, createdBy: user.id });
    await PlanVersion.query(trx).insert({ planId: inserted.id, version: 1, input, note: 'First draft', createdBy: user.id });
    created.push(`plan ${plan.name}`);
  }
}
