/**
 * Sign-in sessions. All use of the `lucia` package lives in this file (ARCHITECTURE.md section 6: v3 is no longer
 * maintained upstream), behind the small SessionAuth interface, so it can be replaced by hand-written sessions on
 * the same two tables.
 */
import { DrizzlePostgreSQLAdapter } from '@lucia-auth/adapter-drizzle';
import { Lucia, TimeSpan } from 'lucia';
import type { Database } from '@/db/client';
import { sessions, users } from '@/db/schema';

export const SESSION_COOKIE = 'sid';

export interface SessionCheck {
  userId: string;
  sessionId: string;
  /** A Set-Cookie value to send when the session was extended or must be cleared. */
  setCookie?: string;
}

export interface SessionAuth {
  /** Starts a session; returns the Set-Cookie value. */
  start(userId: string): Promise<string>;
  /** Reads the cookie header; null when there is no valid session (setCookie then clears a stale cookie). */
  check(cookieHeader: string | undefined): Promise<SessionCheck | { userId: null; setCookie?: string }>;
  end(sessionId: string): Promise<void>;
  endAllFor(userId: string): Promise<void>;
  blankCookie(): string;
  /** Removes expired sessions (housekeeping). */
  deleteExpired(): Promise<void>;
}

export function createSessionAuth(db: Database, options: { secureCookie: boolean }): SessionAuth {
  const lucia = new Lucia(new DrizzlePostgreSQLAdapter(db, sessions, users), {
    sessionExpiresIn: new TimeSpan(30, 'd'),
    sessionCookie: { name: SESSION_COOKIE, attributes: { sameSite: 'lax', secure: options.secureCookie } },
  });
  return {
    async start(userId) {
      const session = await lucia.createSession(userId, {});
      return lucia.createSessionCookie(session.id).serialize();
    },
    async check(cookieHeader) {
      const sessionId = lucia.readSessionCookie(cookieHeader ?? '');
      if (!sessionId) return { userId: null };
      const { session } = await lucia.validateSession(sessionId);
      if (!session) return { userId: null, setCookie: lucia.createBlankSessionCookie().serialize() };
      return {
        userId: session.userId,
        sessionId: session.id,
        setCookie: session.fresh ? lucia.createSessionCookie(session.id).serialize() : undefined,
      };
    },
    end: (sessionId) => lucia.invalidateSession(sessionId),
    endAllFor: (userId) => lucia.invalidateUserSessions(userId),
    blankCookie: () => lucia.createBlankSessionCookie().serialize(),
    deleteExpired: () => lucia.deleteExpiredSessions(),
  };
}
