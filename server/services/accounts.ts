/** Sign up, sign in and out, password reset by mail, and the user's own settings. */
import { randomUUID } from 'node:crypto';
import { claimPasswordReset, insertPasswordReset } from '@/db/queries/tokens';
import { insertMembership, insertTeam, listTeamsOfUser } from '@/db/queries/teams';
import { findUserByEmail, findUserById, insertUser, updateUser } from '@/db/queries/users';
import type { UserRow } from '@/db/schema';
import type { SignInBody, SignUpBody, UpdateMeBody, User } from '@/lib/schema/api-auth';
import { hashPassword, spendPasswordTime, verifyPassword } from '@/server/auth/password';
import { hashToken, newToken } from '@/server/auth/tokens';
import { AppError, notSignedIn } from '@/server/errors';
import { passwordResetMail } from '@/server/mail/messages';
import type { ServiceDeps } from '@/server/services/context';

const RESET_LIFETIME_MS = 60 * 60 * 1000;

export function publicUser(row: UserRow): User {
  return { id: row.id, email: row.email, name: row.name, unitSystem: row.unitSystem };
}

const normaliseEmail = (email: string) => email.trim().toLowerCase();

function isUniqueViolation(err: unknown): boolean {
  for (let e: unknown = err; e && typeof e === 'object'; e = (e as { cause?: unknown }).cause) {
    if ((e as { code?: unknown }).code === '23505') return true;
  }
  return false;
}

export function accountService(deps: ServiceDeps) {
  const { db, auth, mailer, logger } = deps;
  const now = deps.now ?? (() => new Date());

  return {
    async signUp(body: SignUpBody): Promise<{ user: User; cookie: string }> {
      const email = normaliseEmail(body.email);
      const passwordHash = await hashPassword(body.password);
      try {
        const user = await db.transaction(async (tx) => {
          const row = await insertUser(tx, { id: randomUUID(), email, name: body.name, passwordHash });
          const team = await insertTeam(tx, `${body.name}'s team`);
          await insertMembership(tx, team.id, row.id, 'owner');
          return row;
        });
        return { user: publicUser(user), cookie: await auth.start(user.id) };
      } catch (err) {
        if (isUniqueViolation(err)) {
          throw new AppError(409, 'email_taken', 'An account with this e-mail already exists. Sign in instead.', {
            email: 'An account with this e-mail already exists.',
          });
        }
        throw err;
      }
    },

    async signIn(body: SignInBody): Promise<{ user: User; cookie: string }> {
      const user = await findUserByEmail(db, normaliseEmail(body.email));
      if (!user) await spendPasswordTime(body.password); // an unknown e-mail costs as long as a wrong password
      const ok = user ? await verifyPassword(user.passwordHash, body.password) : false;
      if (!user || !ok) throw new AppError(401, 'invalid_credentials', 'That e-mail and password do not match an account.');
      return { user: publicUser(user), cookie: await auth.start(user.id) };
    },

    async signOut(sessionId: string): Promise<string> {
      await auth.end(sessionId);
      return auth.blankCookie();
    },

    /** Always succeeds, so the reply does not reveal whether the address has an account. */
    async forgotPassword(email: string, appOrigin: string): Promise<void> {
      const user = await findUserByEmail(db, normaliseEmail(email));
      if (!user) return;
      const { token, tokenHash } = newToken();
      await insertPasswordReset(db, { userId: user.id, tokenHash, expiresAt: new Date(now().getTime() + RESET_LIFETIME_MS) });
      try {
        await mailer.send(passwordResetMail(user.email, user.name, `${appOrigin}/reset-password?token=${token}`));
      } catch (err) {
        logger.error({ err }, 'password reset mail failed');
      }
    },

    /** Uses the token once, sets the new password and ends every session of that user. */
    async resetPassword(token: string, password: string): Promise<void> {
      const passwordHash = await hashPassword(password);
      const userId = await db.transaction(async (tx) => {
        const id = await claimPasswordReset(tx, hashToken(token), now());
        if (id) await updateUser(tx, id, { passwordHash });
        return id;
      });
      if (!userId) {
        throw new AppError(400, 'invalid_token', 'This reset link is not valid any more (used or older than an hour). Ask for a new one.', {
          token: 'This reset link is not valid any more.',
        });
      }
      await auth.endAllFor(userId);
    },

    async me(userId: string) {
      const user = await findUserById(db, userId);
      if (!user) throw notSignedIn();
      return { user: publicUser(user), teams: await listTeamsOfUser(db, userId) };
    },

    async updateMe(userId: string, body: UpdateMeBody): Promise<User> {
      const user = await updateUser(db, userId, body);
      if (!user) throw notSignedIn();
      return publicUser(user);
    },
  };
}
