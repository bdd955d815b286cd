import { createHash } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FixtureBuilder, type FixtureUser } from './support/fixtures';
import { createTestApp, type TestApp } from './support/test-app';

const hour = 3_600_000;
const pdf = () => Buffer.from(`%PDF-1.4\n% model drawing ${Math.random()}\n%%EOF\n`);
const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);

describe('/api/bookings/:id/attachments', () => {
  let t: TestApp;
  let fixtures: FixtureBuilder;
  let customer: FixtureUser;
  let rival: FixtureUser;
  let technician: FixtureUser;
  let bookingId: string;

  const auth = (user: FixtureUser) => `Bearer ${user.token}`;
  const upload = (user: FixtureUser, id = bookingId) => request(t.app).post(`/api/bookings/${id}/attachments`).set('Authorization', auth(user));

  beforeAll(async () => {
    t = await createTestApp();
    fixtures = new FixtureBuilder(t.knex, t.config.jwtSecret);
    customer = await fixtures.user({ role: 'customer' });
    rival = await fixtures.user({ role: 'customer', organisationId: (await fixtures.customerOrganisation()).id });
    technician = await fixtures.user({ role: 'technician' });
    const start = new Date(Math.ceil((Date.now() + 90 * 24 * hour) / hour) * hour);
    const created = await request(t.app)
      .post('/api/bookings')
      .set('Authorization', auth(customer))
      .send({ tunnelId: await fixtures.tunnelId(), start: start.toISOString(), end: new Date(start.getTime() + 4 * hour).toISOString(), articles: [{ name: 'Lamp post head', referenceAreaKind: 'frontal' }] });
    bookingId = created.body.id;
  });
  afterAll(() => t?.close());

  describe('POST /:id/attachments', () => {
    it('a PDF and a PNG → 201 with their SHA-256; the booking lists them; download returns the same bytes', async () => {
      const drawing = pdf();
      const response = await upload(customer).attach('files', drawing, 'drawing.pdf').attach('files', png, 'photo.png');
      expect(response.status, JSON.stringify(response.body)).toBe(201);
      expect(response.body.map((a: { filename: string; contentType: string }) => [a.filename, a.contentType])).toEqual([
        ['drawing.pdf', 'application/pdf'],
        ['photo.png', 'image/png'],
      ]);
      expect(response.body[0].sha256).toBe(createHash('sha256').update(drawing).digest('hex'));
      const booking = await request(t.app).get(`/api/bookings/${bookingId}`).set('Authorization', auth(customer));
      expect(booking.body.attachments).toHaveLength(2);
      const download = await request(t.app)
        .get(`/api/bookings/${bookingId}/attachments/${response.body[0].id}`)
        .set('Authorization', auth(technician))
        .buffer(true)
        .parse((res, done) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => done(null, Buffer.concat(chunks)));
        });
      expect(download.status).toBe(200);
      expect(download.headers['content-type']).toMatch(/application\/pdf/);
      expect(download.headers['content-disposition']).toMatch(/drawing\.pdf/);
      expect(Buffer.compare(download.body as Buffer, drawing)).toBe(0);
    });

    it('no file → 400 on files; a type we do not take → 400; a .pdf that is not a PDF → 400', async () => {
      expect((await upload(customer).send({})).body.errors[0].field).toBe('files');
      const exe = await upload(customer).attach('files', Buffer.from('MZ'), 'tool.exe');
      expect(exe.status).toBe(400);
      expect(exe.body.errors[0].message).toMatch(/only PDF, PNG, JPEG, DWG and DXF/);
      const fake = await upload(customer).attach('files', png, 'report.pdf');
      expect(fake.status).toBe(400);
      expect(fake.body.errors[0].message).toMatch(/not a valid \.pdf file/);
    });

    it('six files → 400; a file over 20 MB → 413', async () => {
      let six = upload(customer);
      for (let i = 0; i < 6; i += 1) six = six.attach('files', pdf(), `sheet-${i}.pdf`);
      expect((await six).status).toBe(400);
      const big = Buffer.concat([Buffer.from('%PDF-1.4\n'), Buffer.alloc(20 * 1024 * 1024 + 10, 0x20)]);
      const tooLarge = await upload(customer).attach('files', big, 'huge.pdf');
      expect(tooLarge.status).toBe(413);
      expect(tooLarge.body.detail).toMatch(/at most 20 MB/);
    });

    it('another organisation’s customer → 404 on upload and download; technician → 403 on upload', async () => {
      expect((await upload(rival).attach('files', pdf(), 'x.pdf')).status).toBe(404);
      expect((await upload(technician).attach('files', pdf(), 'x.pdf')).status).toBe(403);
      const [first] = (await request(t.app).get(`/api/bookings/${bookingId}`).set('Authorization', auth(customer))).body.attachments;
      expect((await request(t.app).get(`/api/bookings/${bookingId}/attachments/${first.id}`).set('Authorization', auth(rival))).status).toBe(404);
    });

    it('open states take files (the lab manager adds to a confirmed and an in-test booking); closed states and a lapsed hold → 409 and no row', async () => {
      const manager = await fixtures.user({ role: 'lab_manager' });
      const byState = async (state: string, holdExpiresAt: Date | null = null) => {
        const start = new Date(Math.ceil((Date.now() + (100 + Math.random() * 200) * 24 * hour) / hour) * hour);
        const created = await request(t.app)
          .post('/api/bookings')
          .set('Authorization', auth(customer))
          .send({ tunnelId: await fixtures.tunnelId(), start: start.toISOString(), end: new Date(start.getTime() + hour).toISOString(), articles: [{ name: `Mast ${state}`, referenceAreaKind: 'frontal' }] });
        expect(created.status, JSON.stringify(created.body)).toBe(201);
        await t.knex('bookings').where('id', created.body.id).update({ state, hold_expires_at: holdExpiresAt });
        return created.body.id as string;
      };
      const rows = async (id: string) => Number((await t.knex('booking_attachments').where('booking_id', id).count({ n: '*' }).first())?.n);
      for (const state of ['confirmed', 'in_test']) {
        const id = await byState(state);
        const response = await upload(manager, id).attach('files', pdf(), `${state}.pdf`);
        expect(response.status, `${state}: ${JSON.stringify(response.body)}`).toBe(201);
        expect(await rows(id)).toBe(1);
      }
      for (const state of ['completed', 'declined', 'rejected', 'expired']) {
        const id = await byState(state);
        const response = await upload(customer, id).attach('files', pdf(), `${state}.pdf`);
        expect(response.status, state).toBe(409);
        expect(response.body.detail).toMatch(/only be attached to an open booking/);
        expect(await rows(id)).toBe(0);
      }
      // Still "requested" in the table, but the hold ran out before the sweep came round.
      const lapsed = await byState('requested', new Date(Date.now() - 60_000));
      const response = await upload(customer, lapsed).attach('files', pdf(), 'after-the-hold.pdf');
      expect(response.status).toBe(409);
      expect(response.body.detail).toMatch(/provisional hold has lapsed/);
      expect(await rows(lapsed)).toBe(0);
      const held = await byState('quoted', new Date(Date.now() + 24 * hour));
      expect((await upload(customer, held).attach('files', png, 'rig.png')).status).toBe(201);
    });

    it('a cancelled booking → 409', async () => {
      const start = new Date(Math.ceil((Date.now() + 91 * 24 * hour) / hour) * hour);
      const created = await request(t.app)
        .post('/api/bookings')
        .set('Authorization', auth(customer))
        .send({ tunnelId: await fixtures.tunnelId(), start: start.toISOString(), end: new Date(start.getTime() + hour).toISOString(), articles: [{ name: 'Sign board', referenceAreaKind: 'frontal' }] });
      await request(t.app).post(`/api/bookings/${created.body.id}/cancel`).set('Authorization', auth(customer)).send({ reason: 'Not needed' });
      const response = await upload(customer, created.body.id).attach('files', pdf(), 'late.pdf');
      expect(response.status).toBe(409);
    });
  });
});
