import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError } from '../errors/http-error';
import { toProblem } from '../errors/problem';

/** The single error middleware: every failure leaves as problem details; server faults are logged, never shown. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const body = toProblem(error);
  if (body.status >= 500) {
    req.log?.error({ err: error }, 'request failed');
  }
  if (res.headersSent) {
    res.end();
    return;
  }
  res.status(body.status).type('application/problem+json').json({ ...body, instance: req.originalUrl });
};

/** JSON 404 for any `/api` path no router answered. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, 'Not found', `There is no ${req.method} ${req.originalUrl.split('?')[0]} in this API.`));
};
