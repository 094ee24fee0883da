import type { RequestHandler } from 'express';
import type { z } from 'zod';

/** Replaces `req.body` with the parsed value, or passes the zod error on (400 with fields). */
export function validateBody(schema: z.ZodType): RequestHandler {
  return (req, _res, next) => {
    const result = schema.safeParse(req.body ?? {});
    if (!result.success) return next(result.error);
    req.body = result.data;
    next();
  };
}
