import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { RateLimitSetting } from '@server/config';
import { HttpError } from '@server/lib/http-error';

function minutes(ms: number): string {
  const m = Math.ceil(ms / 60_000);
  return m === 1 ? '1 minute' : `${m} minutes`;
}

/**
 * Limits attempts per client address, optionally per address and e-mail, so one account can
 * not be guessed at quickly and a whole classroom behind one address is not locked out by one
 * person's typos. A per-e-mail limit goes after `validateBody`, which reads the e-mail; with
 * `failuresOnly` only answers of 400 and above count.
 */
export function attemptLimit(
  setting: RateLimitSetting,
  options: { perEmail: boolean; what: string; failuresOnly?: boolean },
) {
  return rateLimit({
    windowMs: setting.windowMs,
    limit: setting.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: options.failuresOnly ?? false,
    keyGenerator: (req) => {
      const ip = ipKeyGenerator(req.ip ?? 'unknown');
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
      return options.perEmail ? `${ip}|${email}` : ip;
    },
    handler: (_req, _res, next) => {
      next(
        new HttpError(429, `Too many ${options.what}; try again in ${minutes(setting.windowMs)}`, {
          code: 'rate_limited',
        }),
      );
    },
  });
}
