import knexFactory from 'knex';
import { describe, expect, it } from 'vitest';
import { Organisation } from './models/organisation';
import { User } from './models/user';
import { isStaff, scopeToCaller } from './scope';

// A knex that never connects: only SQL text is built here.
const knex = knexFactory({ client: 'pg' });

describe('scopeToCaller', () => {
  it('leaves a staff query unrestricted', () => {
    const sql = scopeToCaller(User.query(knex), { id: 'u', role: 'analyst', organisationId: 'lab' }).toKnexQuery().toSQL();
    expect(sql.sql).not.toMatch(/where/i);
  });

  it('limits a customer to their own organisation', () => {
    const sql = scopeToCaller(User.query(knex), { id: 'u', role: 'customer', organisationId: 'org-1' }).toKnexQuery().toSQL();
    expect(sql.sql).toMatch(/where "users"\."organisationId" = \?|where "users"\."organisation_id" = \?/);
    expect(sql.bindings).toEqual(['org-1']);
  });

  it('takes the column to compare, e.g. the id of the organisation itself', () => {
    const sql = scopeToCaller(Organisation.query(knex), { id: 'u', role: 'customer', organisationId: 'org-2' }, 'id').toKnexQuery().toSQL();
    expect(sql.sql).toMatch(/"organisations"\."id" = \?/);
    expect(sql.bindings).toEqual(['org-2']);
  });
});

describe('isStaff', () => {
  it('is true for lab roles and false for customers', () => {
    expect(['technician', 'analyst', 'lab_manager'].map((role) => isStaff({ role: role as 'analyst' }))).toEqual([true, true, true]);
    expect(isStaff({ role: 'customer' })).toBe(false);
  });
});
