import { randomBytes } from 'node:crypto';
import type { Role } from '@tunnelwright/contracts';
import { Organisation, Service, Tunnel, User, type Caller } from '@tunnelwright/db';
import type { Knex } from 'knex';
import { signAccessToken } from '../../src/auth/access-tokens';
import { createLinkToken } from '../../src/auth/link-tokens';
import { hashPassword } from '../../src/auth/passwords';
import type { SampleFixtures } from '../../src/routes/route';

/** The password of every fixture user; strong enough for the policy. */
export const fixturePassword = 'Gusty-Lantern-Orchard-73';

let passwordHash: Promise<string> | undefined;

/** A user made by the fixtures, with a ready access token. */
export interface FixtureUser extends Caller {
  email: string;
  name: string;
  token: string;
}

/**
 * Builds records for one test file. Every name and e-mail carries a run-unique suffix, so files sharing
 * the test database never collide. Also serves the route table's sample fixtures for the role matrix.
 */
export class FixtureBuilder implements SampleFixtures {
  private readonly run = randomBytes(4).toString('hex');
  private counter = 0;
  private labOrganisation?: Organisation;
  private defaultCustomerOrganisation?: Organisation;
  readonly password = fixturePassword;

  constructor(
    private readonly knex: Knex,
    private readonly jwtSecret: string,
  ) {}

  unique(): string {
    this.counter += 1;
    return `${this.run}-${this.counter}`;
  }

  /** The one lab organisation of the database, created if the database is empty. */
  async lab(): Promise<Organisation> {
    this.labOrganisation ??=
      (await Organisation.query(this.knex).findOne({ kind: 'lab' })) ??
      (await Organisation.query(this.knex).insert({ name: `Test laboratory ${this.unique()}`, kind: 'lab', timeZone: 'Europe/London', settings: {} }));
    return this.labOrganisation;
  }

  /** A new customer organisation. */
  async customerOrganisation(): Promise<Organisation> {
    return Organisation.query(this.knex).insert({ name: `Test customer ${this.unique()}`, kind: 'customer', settings: {} });
  }

  /** The customer organisation this builder's default customers belong to. */
  async customerOrganisationId(): Promise<string> {
    this.defaultCustomerOrganisation ??= await this.customerOrganisation();
    return this.defaultCustomerOrganisation.id;
  }

  /** A user with the fixture password (unless `activated: false`) and a signed access token. */
  async user(options: { role: Role; organisationId?: string; active?: boolean; activated?: boolean; name?: string }): Promise<FixtureUser> {
    const organisationId = options.organisationId ?? (options.role === 'customer' ? await this.customerOrganisationId() : (await this.lab()).id);
    passwordHash ??= hashPassword(fixturePassword);
    const unique = this.unique();
    const user = await User.query(this.knex).insert({
      email: `${options.role.replace('_', '-')}-${unique}@example.com`,
      name: options.name ?? `Test ${options.role} ${unique}`,
      role: options.role,
      organisationId,
      passwordHash: options.activated === false ? null : await passwordHash,
      active: options.active ?? true,
    });
    return { id: user.id, email: user.email, name: user.name, role: user.role, organisationId, token: signAccessToken(this.jwtSecret, user) };
  }

  async customerUser(): Promise<{ id: string; email: string }> {
    const user = await this.user({ role: 'customer' });
    return { id: user.id, email: user.email };
  }

  async tunnel(overrides: Partial<Tunnel> = {}): Promise<Tunnel> {
    return Tunnel.query(this.knex).insert({
      name: `Test tunnel ${this.unique()}`,
      kind: 'closed',
      description: '',
      width: 2,
      height: 1.5,
      area: 2.9,
      length: 4.5,
      minSpeed: 0,
      maxSpeed: 50,
      pressureGradient: -0.5,
      shapeFactor: 0.86,
      openJetConstants: {},
      capabilities: {},
      ...overrides,
    });
  }

  async tunnelId(): Promise<string> {
    return (await this.tunnel()).id;
  }

  async service(overrides: Partial<Service> = {}): Promise<Service> {
    return Service.query(this.knex).insert({ name: `Test service ${this.unique()}`, description: '', unit: 'hour', rate: 10000, currency: 'GBP', tunnelId: null, ...overrides });
  }

  async serviceId(): Promise<string> {
    return (await this.service()).id;
  }

  /** A user who has been invited but not yet accepted, and the raw link token. */
  async invitation(role: Role = 'customer', name?: string): Promise<{ user: FixtureUser; token: string }> {
    const user = await this.user({ role, activated: false, name });
    const { token } = await this.knex.transaction((trx) => createLinkToken(trx, user.id, 'invitation'));
    return { user, token };
  }

  async invitationToken(): Promise<string> {
    return (await this.invitation()).token;
  }

  async passwordResetToken(): Promise<string> {
    const user = await this.user({ role: 'customer' });
    const { token } = await this.knex.transaction((trx) => createLinkToken(trx, user.id, 'password_reset'));
    return token;
  }
}
