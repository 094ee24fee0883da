import type { RequestHandler } from 'express';
import { HttpError } from '@server/lib/http-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request forgery guard for cookie sessions: a request that changes something must
 * carry an Origin header naming this server (the Host it was sent to) or the configured
 * APP_URL. Browsers always send Origin on POST, PATCH, PUT and DELETE; scripts must set it.
 */
export function originCheck(appUrl: string): RequestHandler {
  const allowed = new URL(appUrl).host;
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = req.get('origin');
    let originHost: string | null = null;
    try {
      originHost = origin ? new URL(origin).host : null;
    } catch {
      originHost = null;
    }
    const host = req.get('host');
    if (originHost && (originHost === host || originHost === allowed)) return next();
    next(
      new HttpError(403, 'This request did not come from a Mixwright page (missing or foreign Origin header)', {
        code: 'origin_mismatch',
      }),
    );
  };
}
