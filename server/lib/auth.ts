import { DrizzleSQLiteAdapter } from '@lucia-auth/adapter-drizzle';
import { Lucia, TimeSpan } from 'lucia';
import type { Db } from '@server/db/client';
import { sessions, users } from '@server/db/schema';
import { hashToken, newToken } from '@server/lib/ids';
import type { CurrentUser } from '@shared/schemas/auth';

/**
 * Sessions, kept behind this one module so the session library could be swapped without
 * touching routes: an opaque random token (256 bits) in an httpOnly, SameSite=Lax cookie
 * (Secure in production) and a row in `sessions` with an expiry. The row's id is the token's
 * SHA-256, never the token: a copied database holds no working session. A session used in the
 * second half of its life is extended, and the cookie renewed.
 */
export interface SessionCheck {
  user: CurrentUser | null;
  /** The session's stored id (the token's hash), for ending it. */
  sessionId: string | null;
  /** A Set-Cookie value to send back when the session was extended or is no longer valid. */
  setCookie: string | null;
}

export interface Auth {
  cookieName: string;
  startSession: (userId: string) => Promise<string>;
  check: (cookieHeader: string | undefined) => Promise<SessionCheck>;
  endSession: (sessionId: string) => Promise<string>;
  endAllSessions: (userId: string) => Promise<void>;
}

export const SESSION_COOKIE = 'mixwright_session';

function buildLucia(db: Db, options: { secure: boolean; sessionDays: number }) {
  const adapter = new DrizzleSQLiteAdapter(db, sessions, users);
  return new Lucia(adapter, {
    sessionExpiresIn: new TimeSpan(options.sessionDays, 'd'),
    sessionCookie: { name: SESSION_COOKIE, attributes: { secure: options.secure, sameSite: 'lax' } },
    getUserAttributes: (row) => ({ email: row.email, name: row.name }),
  });
}

declare module 'lucia' {
  interface Register {
    Lucia: ReturnType<typeof buildLucia>;
    DatabaseUserAttributes: { email: string; name: string };
  }
}

export function createAuth(db: Db, options: { secure: boolean; sessionDays: number }): Auth {
  const lucia = buildLucia(db, options);
  return {
    cookieName: lucia.sessionCookieName,
    async startSession(userId) {
      const token = newToken();
      await lucia.createSession(userId, {}, { sessionId: hashToken(token) });
      return lucia.createSessionCookie(token).serialize();
    },
    async check(cookieHeader) {
      const token = lucia.readSessionCookie(cookieHeader ?? '');
      if (!token) return { user: null, sessionId: null, setCookie: null };
      const { session, user } = await lucia.validateSession(hashToken(token));
      if (!session) return { user: null, sessionId: null, setCookie: lucia.createBlankSessionCookie().serialize() };
      return {
        user: { id: user.id, email: user.email, name: user.name },
        sessionId: session.id,
        setCookie: session.fresh ? lucia.createSessionCookie(token).serialize() : null,
      };
    },
    async endSession(sessionId) {
      await lucia.invalidateSession(sessionId);
      return lucia.createBlankSessionCookie().serialize();
    },
    async endAllSessions(userId) {
      await lucia.invalidateUserSessions(userId);
    },
  };
}
