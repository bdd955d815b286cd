import { extname } from 'node:path';
import { acceptsAttachments, provisionalStates } from '@tunnelwright/contracts';
import { Booking, BookingAttachment, isStaff, recordAudit, type User } from '@tunnelwright/db';
import type { Request, Response } from 'express';
import multer from 'multer';
import { attachmentKinds, looksLike, readAttachment, storeAttachment } from '../bookings/attachment-store';
import { HttpError } from '../errors/http-error';
import { sampleBookingId } from './booking-samples';
import { route, type RouteDef } from './route';

/** At most this many files of at most this many bytes per upload. */
export const attachmentLimits = { files: 5, fileSize: 20 * 1024 * 1024 };

const upload = multer({ storage: multer.memoryStorage(), limits: { files: attachmentLimits.files, fileSize: attachmentLimits.fileSize, fields: 5 } }).array('files', attachmentLimits.files);

/** Parses the multipart body, turning multer's limits into plain 4xx problems. */
async function receiveFiles(req: Request, res: Response): Promise<Express.Multer.File[]> {
  await new Promise<void>((resolve, reject) => {
    upload(req, res, (error: unknown) => {
      if (!error) return resolve();
      if (error instanceof multer.MulterError) {
        if (error.code === 'LIMIT_FILE_SIZE') return reject(new HttpError(413, 'File too large', `Each file may be at most ${attachmentLimits.fileSize / 1024 / 1024} MB.`));
        if (error.code === 'LIMIT_FILE_COUNT' || error.code === 'LIMIT_UNEXPECTED_FILE') return reject(HttpError.field('files', `Attach at most ${attachmentLimits.files} files, in the field "files"`));
        return reject(HttpError.field('files', 'The upload could not be read'));
      }
      reject(error instanceof Error ? error : new Error(String(error)));
    });
  });
  return (req.files as Express.Multer.File[] | undefined) ?? [];
}

async function bookingFor(caller: User, id: string): Promise<Booking> {
  const booking = await Booking.query().findById(id);
  if (!booking || (!isStaff(caller) && booking.organisationId !== caller.organisationId)) throw HttpError.notFound('The booking');
  return booking;
}

/** The 409 unless files can still be added to `booking`: it is open and, if provisional, its hold has not lapsed. */
function assertAcceptsAttachments(booking: Booking): void {
  if (acceptsAttachments(booking)) return;
  const why = provisionalStates.includes(booking.state) ? 'its provisional hold has lapsed' : `it is ${booking.state.replace('_', ' ')}`;
  throw new HttpError(409, 'Not possible in this state', `Files can only be attached to an open booking; this one is closed because ${why}.`);
}

/** /api/bookings/:id/attachments: drawings and documents for a booking, stored content-addressed. */
export const bookingAttachmentRoutes: RouteDef[] = [
  route({
    method: 'post',
    path: '/:id/attachments',
    access: ['customer', 'lab_manager'],
    summary: `Attach up to ${attachmentLimits.files} files (PDF, PNG, JPEG, DWG, DXF; 20 MB each) as multipart field "files"`,
    // The matrix sends no multipart body, so an allowed caller is told to attach a file.
    sample: { params: async (f) => ({ id: await sampleBookingId(f, 'requested') }), expect: 400, crossOrganisation: true },
    handler: async ({ caller, params, deps, req, res }) => {
      const booking = await bookingFor(caller, params.id ?? '');
      // Refused before the body is read, so a closed booking costs no upload; checked again under lock below.
      assertAcceptsAttachments(booking);
      const files = await receiveFiles(req, res);
      if (files.length === 0) throw HttpError.field('files', 'Attach at least one file in the field "files"');
      const checked = files.map((file, index) => {
        const extension = extname(file.originalname).slice(1).toLowerCase();
        const kind = attachmentKinds[extension];
        if (!kind) throw HttpError.field(`files.${index}`, `${file.originalname}: only PDF, PNG, JPEG, DWG and DXF files are accepted`);
        if (!looksLike(extension, file.buffer)) throw HttpError.field(`files.${index}`, `${file.originalname} is not a valid .${extension} file`);
        return { file, contentType: kind.contentType };
      });
      const stored = await Promise.all(checked.map(async (c) => ({ ...c, sha256: await storeAttachment(c.file.buffer) })));
      const created = await deps.knex.transaction(async (trx) => {
        // The booking may have been cancelled or its hold lapsed while the files arrived.
        const locked = await Booking.query(trx).findById(booking.id).forUpdate();
        if (!locked) throw HttpError.notFound('The booking');
        assertAcceptsAttachments(locked);
        const rows = await BookingAttachment.query(trx)
          .insert(stored.map((s) => ({ bookingId: booking.id, filename: s.file.originalname.slice(0, 255), contentType: s.contentType, sizeBytes: s.file.size, sha256: s.sha256, uploadedBy: caller.id })))
          .returning('*');
        await recordAudit(trx, { actorId: caller.id, action: 'booking.attachments_added', entity: 'booking', entityId: booking.id, after: rows.map((r) => ({ id: r.id, filename: r.filename, sha256: r.sha256 })) });
        return rows;
      });
      res.status(201).json(created.map((a) => ({ id: a.id, filename: a.filename, contentType: a.contentType, sizeBytes: Number(a.sizeBytes), sha256: a.sha256, createdAt: new Date(a.createdAt).toISOString() })));
    },
  }),
  route({
    method: 'get',
    path: '/:id/attachments/:attachmentId',
    access: 'authenticated',
    summary: 'Download one attachment of a booking',
    sample: {
      params: async (f) => {
        const id = await sampleBookingId(f, 'requested');
        const content = Buffer.from(`%PDF-1.4\n% matrix sample ${f.unique()}\n`);
        const customer = await f.customerUser();
        const attachment = await BookingAttachment.query().insert({ bookingId: id, filename: 'plan.pdf', contentType: 'application/pdf', sizeBytes: content.length, sha256: await storeAttachment(content), uploadedBy: customer.id });
        return { id, attachmentId: attachment.id };
      },
      expect: 200,
      crossOrganisation: true,
    },
    handler: async ({ caller, params, res }) => {
      const booking = await bookingFor(caller, params.id ?? '');
      const attachment = await BookingAttachment.query().findOne({ id: params.attachmentId ?? '', bookingId: booking.id });
      if (!attachment) throw HttpError.notFound('The attachment');
      const content = await readAttachment(attachment.sha256);
      res.type(attachment.contentType).attachment(attachment.filename).send(content);
    },
  }),
];
