import type { AppContext } from '@server/config';
import { recordEvent } from '@server/features/activity/activity.repository';
import { HttpError } from '@server/lib/http-error';
import { hashToken, newToken } from '@server/lib/ids';
import { hashPassword, verifyPassword } from '@server/lib/password';
import type { CurrentUser, PasswordResetInput, SignInInput, SignUpInput } from '@shared/schemas/auth';
import {
  consumeResetToken,
  deleteUnusedResetTokens,
  findUserByEmail,
  findUserById,
  insertUser,
  replaceResetToken,
  updatePasswordHash,
} from './auth.repository';

/** One answer for an unknown e-mail and a wrong password, so sign-in does not reveal accounts. */
export const SIGN_IN_FAILED = 'That e-mail and password do not match an account';

const toCurrentUser = (row: { id: string; email: string; name: string }): CurrentUser => ({
  id: row.id,
  email: row.email,
  name: row.name,
});

export async function signUp(ctx: AppContext, input: SignUpInput): Promise<CurrentUser> {
  if (findUserByEmail(ctx.db, input.email)) {
    throw new HttpError(409, 'An account with this e-mail already exists; sign in instead', {
      code: 'email_taken',
      fields: { email: 'An account with this e-mail already exists' },
    });
  }
  const passwordHash = await hashPassword(input.password, ctx.config.passwordCost);
  const user = insertUser(ctx.db, { email: input.email, name: input.name, passwordHash });
  recordEvent(ctx.db, { teamId: null, actorId: user.id, action: 'user.signed_up', target: `user:${user.id}` });
  return toCurrentUser(user);
}

// Hash of a password nobody has, checked when the e-mail is unknown so both answers take as long.
let decoyHash: Promise<string> | null = null;

export async function signIn(ctx: AppContext, input: SignInInput): Promise<CurrentUser> {
  const user = findUserByEmail(ctx.db, input.email);
  if (!user) {
    decoyHash ??= hashPassword('no account has this password', ctx.config.passwordCost);
    await verifyPassword(await decoyHash, input.password);
    throw new HttpError(401, SIGN_IN_FAILED, { code: 'invalid_credentials' });
  }
  if (!(await verifyPassword(user.passwordHash, input.password))) {
    throw new HttpError(401, SIGN_IN_FAILED, { code: 'invalid_credentials' });
  }
  recordEvent(ctx.db, { teamId: null, actorId: user.id, action: 'user.signed_in', target: `user:${user.id}` });
  return toCurrentUser(user);
}

/**
 * Sends a one-time link when the e-mail has an account, replacing any older link. The route
 * answers first and runs this afterwards, so the answer takes as long for an unknown e-mail as
 * for a known one and says nothing either way.
 */
export async function sendPasswordResetLink(ctx: AppContext, email: string): Promise<void> {
  const user = findUserByEmail(ctx.db, email);
  if (!user) return;
  const token = newToken();
  const expiresAt = new Date(Date.now() + ctx.config.passwordResetMinutes * 60_000);
  replaceResetToken(ctx.db, { tokenHash: hashToken(token), userId: user.id, expiresAt });
  const link = `${ctx.config.appUrl}/reset-password?token=${token}`;
  await ctx.mailer.send({
    to: user.email,
    subject: 'Reset your Mixwright password',
    text: [
      `Hello ${user.name},`,
      '',
      'Someone (hopefully you) asked to reset the password of your Mixwright account.',
      `Open this link within ${ctx.config.passwordResetMinutes} minutes to choose a new one:`,
      '',
      link,
      '',
      'The link works once, and only until you ask for another. If you did not ask for it, ignore this e-mail; your password stays as it is.',
    ].join('\n'),
  });
}

export async function resetPassword(ctx: AppContext, input: PasswordResetInput): Promise<CurrentUser> {
  const now = new Date();
  const token = consumeResetToken(ctx.db, hashToken(input.token), now);
  if (!token || token.expiresAt.getTime() < now.getTime()) {
    throw new HttpError(400, 'This reset link has expired or was already used; ask for a new one', {
      code: 'reset_link_invalid',
    });
  }
  const user = findUserById(ctx.db, token.userId);
  if (!user) throw new HttpError(400, 'This reset link has expired or was already used; ask for a new one');
  updatePasswordHash(ctx.db, user.id, await hashPassword(input.password, ctx.config.passwordCost));
  deleteUnusedResetTokens(ctx.db, user.id);
  // Anyone signed in with the old password is signed out.
  await ctx.auth.endAllSessions(user.id);
  recordEvent(ctx.db, { teamId: null, actorId: user.id, action: 'user.password_reset', target: `user:${user.id}` });
  return toCurrentUser(user);
}
