import { createSecretKey } from 'node:crypto';
import type { RequestHandler } from 'express';
import { Passport } from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import { User } from '@tunnelwright/db';
import { HttpError } from '../errors/http-error';
import type { AccessClaims } from './access-tokens';

/**
 * Builds the bearer-token check. A token is accepted only if it is a valid HS256 JWT signed with our
 * secret and its user still exists and is active, so deactivation takes effect at the next request.
 */
export function createAuthenticate(secret: string): RequestHandler {
  const key = createSecretKey(Buffer.from(secret, 'utf8'));
  const passport = new Passport();
  passport.use(
    new JwtStrategy(
      {
        jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
        // A KeyObject, not the plain string: given a string, jsonwebtoken first tries to parse it as a
        // public key on every request, which costs about 0.5 ms per verification on this hardware.
        secretOrKeyProvider: (_req, _rawJwt, done) => done(null, key as unknown as string),
        algorithms: ['HS256'],
      },
      (claims: AccessClaims, done: (error: unknown, user?: User | false) => void) => {
        User.query()
          .findById(claims.sub)
          .withGraphFetched('organisation')
          .then((user) => done(null, user && user.active && user.passwordHash ? user : false))
          .catch((error: unknown) => done(error));
      },
    ),
  );
  const middleware = passport.initialize();
  return (req, res, next) => {
    middleware(req, res, () => {
      passport.authenticate('jwt', { session: false }, (error: unknown, user: User | false) => {
        if (error) return next(error);
        if (!user) return next(new HttpError(401, 'Sign-in required', 'Sign in to continue: your session is missing, expired or no longer valid.'));
        req.user = user;
        next();
      })(req, res, next);
    });
  };
}
