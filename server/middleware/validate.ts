import express, { type RequestHandler } from 'express';
import type { z } from 'zod';
import { HttpError } from '@server/lib/http-error';

/**
 * Largest JSON body each kind of request may carry. A body is read only by the route that
 * needs it, after the origin, session and role checks, so a stranger cannot make the server
 * parse a megabyte to be told 403; and a sign-in is a few fields, not a megabyte.
 */
export const BODY_LIMITS = {
  /** Sign-in, sign-up, password reset: an e-mail, a name, a password. */
  account: 4 * 1024,
  /** A name, a role, a message, a boot line. */
  standard: 16 * 1024,
  /** A whole robot configuration (a typical one is 5 KB). */
  configuration: 256 * 1024,
} as const;

/** Deeper than any request of the app nests (a configuration nests about seven levels). */
export const MAX_JSON_DEPTH = 32;

/**
 * Refuses JSON text nesting arrays or objects deeper than `maxDepth`, by one pass over the raw
 * bytes before parsing, so a body of a hundred thousand brackets costs a scan, not a parse.
 */
export function nestsDeeperThan(raw: Buffer, maxDepth: number): boolean {
  let depth = 0;
  let inString = false;
  for (let i = 0; i < raw.length; i += 1) {
    const byte = raw[i];
    if (inString) {
      if (byte === 0x5c)
        i += 1; // backslash: the next byte is escaped
      else if (byte === 0x22) inString = false;
    } else if (byte === 0x22) {
      inString = true;
    } else if (byte === 0x5b || byte === 0x7b) {
      depth += 1;
      if (depth > maxDepth) return true;
    } else if (byte === 0x5d || byte === 0x7d) {
      depth -= 1;
    }
  }
  return false;
}

function jsonParser(limitBytes: number): RequestHandler {
  return express.json({
    limit: limitBytes,
    verify: (_req, _res, raw) => {
      if (nestsDeeperThan(raw, MAX_JSON_DEPTH)) {
        throw new HttpError(400, `The request body nests deeper than ${MAX_JSON_DEPTH} levels`, {
          code: 'too_deep',
        });
      }
    },
  });
}

/**
 * Reads the JSON body (at most `limitBytes`, nesting at most MAX_JSON_DEPTH levels) and replaces
 * `req.body` with the parsed value, or passes the zod error on (400 with fields). Put it after
 * the route's access checks: the body is not read before they pass.
 */
export function validateBody(schema: z.ZodType, limitBytes: number = BODY_LIMITS.standard): RequestHandler {
  const parse = jsonParser(limitBytes);
  return (req, res, next) => {
    parse(req, res, (error?: unknown) => {
      if (error) return next(error);
      const result = schema.safeParse(req.body ?? {});
      if (!result.success) return next(result.error);
      req.body = result.data;
      next();
    });
  };
}
