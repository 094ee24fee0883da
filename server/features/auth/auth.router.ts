import { Router } from 'express';
import type { AppContext } from '@server/config';
import { attemptLimit } from '@server/middleware/rate-limit';
import { currentUser, requireUser } from '@server/middleware/session';
import { BODY_LIMITS, validateBody } from '@server/middleware/validate';
import {
  PasswordResetInputSchema,
  PasswordResetRequestSchema,
  SignInInputSchema,
  SignUpInputSchema,
} from '@shared/schemas/auth';
import { resetPassword, sendPasswordResetLink, signIn, signUp } from './auth.service';

export function authRoutes(ctx: AppContext): Router {
  const router = Router();
  const signInLimit = attemptLimit(ctx.config.rateLimits.signIn, { perEmail: true, what: 'sign-in attempts' });
  const signInAddressLimit = attemptLimit(ctx.config.rateLimits.signInPerAddress, {
    perEmail: false,
    failuresOnly: true,
    what: 'failed sign-ins from this address',
  });
  const resetLimit = attemptLimit(ctx.config.rateLimits.passwordReset, { perEmail: false, what: 'reset requests' });
  const confirmLimit = attemptLimit(ctx.config.rateLimits.passwordReset, { perEmail: false, what: 'reset attempts' });
  const signUpLimit = attemptLimit(ctx.config.rateLimits.signUp, {
    perEmail: false,
    what: 'sign-ups from this address',
  });

  router.post('/auth/sign-up', signUpLimit, validateBody(SignUpInputSchema, BODY_LIMITS.account), async (req, res) => {
    const user = await signUp(ctx, req.body);
    res.append('Set-Cookie', await ctx.auth.startSession(user.id));
    res.status(201).json({ user });
  });

  // The per-address limit needs no body, so it runs first; the per-account one reads the e-mail.
  router.post(
    '/auth/sign-in',
    signInAddressLimit,
    validateBody(SignInInputSchema, BODY_LIMITS.account),
    signInLimit,
    async (req, res) => {
      const user = await signIn(ctx, req.body);
      res.append('Set-Cookie', await ctx.auth.startSession(user.id));
      res.json({ user });
    },
  );

  router.post('/auth/sign-out', requireUser, async (req, res) => {
    res.append('Set-Cookie', await ctx.auth.endSession(req.sessionId!));
    res.status(204).end();
  });

  router.get('/auth/me', requireUser, (req, res) => {
    res.json({ user: currentUser(req) });
  });

  router.post(
    '/auth/password-reset',
    resetLimit,
    validateBody(PasswordResetRequestSchema, BODY_LIMITS.account),
    (req, res) => {
      res.status(202).json({ message: 'If that e-mail has an account, a reset link is on its way' });
      const email: string = req.body.email;
      ctx.background.run('Password reset e-mail', () => sendPasswordResetLink(ctx, email));
    },
  );

  router.post(
    '/auth/password-reset/confirm',
    confirmLimit,
    validateBody(PasswordResetInputSchema, BODY_LIMITS.account),
    async (req, res) => {
      const user = await resetPassword(ctx, req.body);
      res.append('Set-Cookie', await ctx.auth.startSession(user.id));
      res.json({ user });
    },
  );

  return router;
}
