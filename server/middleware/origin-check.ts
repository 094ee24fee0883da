import type { Request, RequestHandler } from 'express';
import { HttpError } from '@server/lib/http-error';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** `scheme://host[:port]`, with default ports dropped, or null when it is not a web address. */
function originOf(address: string): string | null {
  try {
    const url = new URL(address);
    return url.protocol === 'http:' || url.protocol === 'https:' ? url.origin : null;
  } catch {
    return null;
  }
}

/** The origin this request was sent to: its scheme (as the trusted proxies report it) and Host. */
function requestOrigin(req: Request): string | null {
  const host = req.get('host');
  return host ? originOf(`${req.protocol}://${host}`) : null;
}

/**
 * Cross-site request forgery guard for cookie sessions: a request that changes something must
 * carry an Origin header naming this server (the scheme, host and port it was sent to) or the
 * configured APP_URL. Browsers always send Origin on POST, PATCH, PUT and DELETE; scripts must
 * set it. The scheme counts: an https page of the same host name is another site.
 */
export function originCheck(appUrl: string): RequestHandler {
  const allowed = originOf(appUrl);
  return (req, _res, next) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const origin = originOf(req.get('origin') ?? '');
    if (origin && (origin === allowed || origin === requestOrigin(req))) return next();
    next(
      new HttpError(403, 'This request did not come from a Mixwright page (missing or foreign Origin header)', {
        code: 'origin_mismatch',
      }),
    );
  };
}
