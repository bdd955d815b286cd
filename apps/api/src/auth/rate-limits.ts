import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { Redis } from 'ioredis';
import { HttpError } from '../errors/http-error';
import { RedisRateLimitStore } from './redis-rate-limit-store';

const fifteenMinutes = 15 * 60 * 1000;

function clientIp(req: Request): string {
  return ipKeyGenerator(req.ip ?? req.socket.remoteAddress ?? 'unknown');
}

function bodyEmail(req: Request): string {
  const email: unknown = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : '';
}

function limiter(redis: Redis, prefix: string, options: { limit: number; keyGenerator: (req: Request) => string; skipSuccessfulRequests?: boolean; message: string }): RequestHandler {
  return rateLimit({
    windowMs: fifteenMinutes,
    limit: options.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: options.skipSuccessfulRequests ?? false,
    keyGenerator: options.keyGenerator,
    store: new RedisRateLimitStore(redis, prefix),
    handler: (_req, _res, next) => next(new HttpError(429, 'Too many attempts', options.message)),
  });
}

/**
 * Sign-in limits: 10 failed attempts per 15 minutes for one e-mail from one address, and 100 attempts
 * per 15 minutes from one address whatever the e-mail.
 */
export function loginRateLimits(redis: Redis, prefix: string): RequestHandler[] {
  return [
    limiter(redis, `${prefix}login-ip:`, {
      limit: 100,
      keyGenerator: clientIp,
      message: 'Too many sign-in attempts from this address. Wait a few minutes and try again.',
    }),
    limiter(redis, `${prefix}login-fail:`, {
      limit: 10,
      keyGenerator: (req) => `${clientIp(req)}|${bodyEmail(req)}`,
      skipSuccessfulRequests: true,
      message: 'Too many failed sign-in attempts. Wait 15 minutes and try again, or reset your password.',
    }),
  ];
}

/** Password-reset requests: 5 per 15 minutes per address and e-mail, 30 per address. */
export function forgotPasswordRateLimits(redis: Redis, prefix: string): RequestHandler[] {
  return [
    limiter(redis, `${prefix}forgot-ip:`, {
      limit: 30,
      keyGenerator: clientIp,
      message: 'Too many reset requests from this address. Wait a few minutes and try again.',
    }),
    limiter(redis, `${prefix}forgot:`, {
      limit: 5,
      keyGenerator: (req) => `${clientIp(req)}|${bodyEmail(req)}`,
      message: 'Too many reset requests for this address. Check your inbox, or wait 15 minutes.',
    }),
  ];
}

/** Public sheet checks: 60 file checks per 15 minutes from one address, so the open upload cannot be used to load the server. */
export function verifyCheckRateLimits(redis: Redis, prefix: string): RequestHandler[] {
  return [
    limiter(redis, `${prefix}verify-ip:`, {
      limit: 60,
      keyGenerator: clientIp,
      message: 'Too many files checked from this address. Wait a few minutes and try again.',
    }),
  ];
}
