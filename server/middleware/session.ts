import type { RequestHandler } from 'express';
import type { Auth } from '@server/lib/auth';
import { HttpError } from '@server/lib/http-error';
import type { CurrentUser } from '@shared/schemas/auth';
import type { Role } from '@shared/schemas/teams';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    interface Request {
      /** Set by `loadSession` when the session cookie is valid. */
      user?: CurrentUser;
      sessionId?: string;
      /** Set by the team and robot access checks. */
      access?: { teamId: string; role: Role };
    }
  }
}

/** Reads the session cookie on every API request; renews or clears the cookie when needed. */
export function loadSession(auth: Auth): RequestHandler {
  return async (req, res, next) => {
    const result = await auth.check(req.get('cookie'));
    if (result.setCookie) res.append('Set-Cookie', result.setCookie);
    if (result.user && result.sessionId) {
      req.user = result.user;
      req.sessionId = result.sessionId;
    }
    next();
  };
}

export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) return next(new HttpError(401, 'Sign in to continue'));
  next();
};

/** The signed-in user, for handlers behind `requireUser`. */
export function currentUser(req: Express.Request): CurrentUser {
  if (!req.user) throw new HttpError(401, 'Sign in to continue');
  return req.user;
}
