/**
 * Seeds the invented demo laboratory: organisations, one user per role, two tunnels and the services.
 * Idempotent: records are found by their natural key (name or e-mail) and left as they are if present.
 *   SEED_DATABASE_URL or DATABASE_URL chooses the database (default: the local demo database).
 */
import type { Knex } from 'knex';
import argon2 from 'argon2';
import { createKnex, migrationConfig, Organisation, recordAudit, Service, Tunnel, User } from '@tunnelwright/db';
import { seedApproval } from './seed/approval';
import { seedBookings } from './seed/bookings';
import { demoServices, demoTunnels } from './seed/catalogue';
import { demoCustomers, demoLab, demoPassword, demoUsers } from './seed/demo-users';
import { seedIngest } from './seed/ingest';
import { seedPlanCertifiedLink } from './seed/plan-certified-link';
import { seedPlans } from './seed/plans';

async function ensureOrganisation(trx: Knex.Transaction, name: string, kind: 'lab' | 'customer', created: string[]): Promise<Organisation> {
  // There is exactly one lab; if the database already has one (under any name) it is the demo lab.
  const existing = kind === 'lab' ? await Organisation.query(trx).findOne({ kind: 'lab' }) : await Organisation.query(trx).findOne({ name });
  if (existing) return existing;
  created.push(`organisation ${name}`);
  return Organisation.query(trx).insert({
    name,
    kind,
    timeZone: kind === 'lab' ? demoLab.timeZone : null,
    settings: kind === 'lab' ? { defaultCurrency: demoLab.currency } : {},
  });
}

async function seed(knex: Knex): Promise<string[]> {
  const created: string[] = [];
  const passwordHash = await argon2.hash(demoPassword, { type: argon2.argon2id });
  await knex.transaction(async (trx) => {
    const lab = await ensureOrganisation(trx, demoLab.name, 'lab', created);
    const organisations = new Map<string, Organisation>([[demoLab.name, lab]]);
    for (const name of Object.values(demoCustomers)) organisations.set(name, await ensureOrganisation(trx, name, 'customer', created));

    for (const person of demoUsers) {
      if (await User.query(trx).findOne({ email: person.email })) continue;
      const organisation = organisations.get(person.organisation);
      if (!organisation) throw new Error(`Demo user ${person.email} names an unknown organisation`);
      await User.query(trx).insert({ email: person.email, name: person.name, role: person.role, organisationId: organisation.id, passwordHash, active: true });
      created.push(`user ${person.email}`);
    }

    const tunnelIds = new Map<string, string>();
    for (const tunnel of demoTunnels) {
      const existing = await Tunnel.query(trx).findOne({ name: tunnel.name });
      if (existing) {
        tunnelIds.set(tunnel.name, existing.id);
        continue;
      }
      const inserted = await Tunnel.query(trx).insert(tunnel);
      tunnelIds.set(tunnel.name, inserted.id);
      created.push(`tunnel ${tunnel.name}`);
    }

    for (const { tunnel, ...service } of demoServices) {
      if (await Service.query(trx).findOne({ name: service.name })) continue;
      await Service.query(trx).insert({ ...service, tunnelId: tunnel ? (tunnelIds.get(tunnel) ?? null) : null });
      created.push(`service ${service.name}`);
    }

    await seedPlans(trx, created);

    await seedBookings(trx, created);

    if (created.length > 0) {
      await recordAudit(trx, { actorId: null, action: 'demo.seeded', entity: 'system', entityId: null, after: { created } });
    }
  });
  return created;
}

const url = process.env.SEED_DATABASE_URL ?? process.env.DATABASE_URL;
const knex = createKnex(url);
try {
  await knex.migrate.latest(migrationConfig);
  const created = await seed(knex);
  await seedIngest(knex, created);
  await seedApproval(knex, created, (process.env.PUBLIC_URL ?? 'http://localhost:3000').replace(/\/+$/, ''));
  await seedPlanCertifiedLink(knex, created);
  console.log(created.length === 0 ? 'Demo data already present; nothing changed.' : `Created:\n  ${created.join('\n  ')}`);
  console.log(`\nDemo sign-ins (password for all: ${demoPassword}):`);
  for (const person of demoUsers) console.log(`  ${person.role.padEnd(12)} ${person.email.padEnd(34)} ${person.name} — ${person.organisation}`);
} catch (error) {
  console.error('Seeding failed:', error instanceof Error ? error.message : error);
  process.exitCode = 1;
} finally {
  await knex.destroy();
}
