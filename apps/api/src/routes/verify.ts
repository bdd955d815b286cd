import type { Verification } from '@tunnelwright/contracts';
import { ResultSheet } from '@tunnelwright/db';
import express from 'express';
import { verifyCheckRateLimits } from '../auth/rate-limits';
import { HttpError } from '../errors/http-error';
import { sha256Hex, verifyIssuedFile } from '../reports/issued-file-hash';
import { sampleIssuedSheet } from './approval-samples';
import { route, type RouteDef } from './route';

/** Largest file the public check accepts; issued sheets are far smaller. */
const maxCheckBytes = 25 * 1024 * 1024;

async function verification(reportNumber: string): Promise<{ sheet: ResultSheet; view: Verification }> {
  const sheet = await ResultSheet.query().select('id', 'reportNumber', 'issueDate', 'state', 'sha256', 'supersededById').findOne({ reportNumber });
  if (!sheet) throw new HttpError(404, 'Unknown report number', `No sheet with the number ${reportNumber} was issued by this laboratory. Check the number printed at the top of each page.`);
  const successor = sheet.supersededById ? await ResultSheet.query().select('reportNumber', 'issueDate').findById(sheet.supersededById) : undefined;
  return {
    sheet,
    view: {
      reportNumber: sheet.reportNumber,
      issueDate: sheet.issueDate,
      state: sheet.state,
      successor: successor ? { reportNumber: successor.reportNumber, issueDate: successor.issueDate } : null,
      sha256: sheet.sha256.trim(),
    },
  };
}

/** /api/verify/:reportNumber: the public check of an issued sheet. It shows the number, date, state and hash only. */
export const verifyRoutes: RouteDef[] = [
  route({
    method: 'get',
    path: '/:reportNumber',
    access: 'public',
    summary: 'Whether a report number was issued, its issue date, whether it is valid or superseded (and by what), and its SHA-256',
    sample: { params: async (f) => ({ reportNumber: (await sampleIssuedSheet(f)).reportNumber }), expect: 200 },
    handler: async ({ params, res }) => {
      res.set('Cache-Control', 'no-store').json((await verification(params.reportNumber ?? '')).view);
    },
  }),
  route({
    method: 'post',
    path: '/:reportNumber',
    access: 'public',
    summary: 'Check a PDF (raw body, application/pdf, up to 25 MB) against the issued sheet of that number, byte for byte',
    middleware: (deps) => [...verifyCheckRateLimits(deps.redis, deps.rateLimitPrefix ?? 'tw:rl:'), express.raw({ type: ['application/pdf', 'application/octet-stream'], limit: maxCheckBytes })],
    sample: {
      params: async (f) => ({ reportNumber: (await sampleIssuedSheet(f)).reportNumber }),
      expect: 400,
    },
    handler: async ({ params, req, res }) => {
      const { sheet, view } = await verification(params.reportNumber ?? '');
      const body: unknown = req.body;
      if (!Buffer.isBuffer(body) || body.length === 0) {
        throw new HttpError(400, 'No file', 'Send the PDF itself as the request body, with Content-Type application/pdf.');
      }
      res.set('Cache-Control', 'no-store').json({ ...view, matches: verifyIssuedFile(body, sheet.sha256.trim()), fileSha256: sha256Hex(body), fileSize: body.length });
    },
  }),
];
