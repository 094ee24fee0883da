import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { GateFullError } from '@server/lib/concurrency-gate';
import { HttpError } from '@server/lib/http-error';

/** Field path → first message, with paths dotted (`config.chassis.wheels.0.radiusMm`). */
export function zodFields(error: ZodError, prefix: string[] = []): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = [...prefix, ...issue.path.map(String)].join('.') || '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

export function zodMessage(fields: Record<string, string>): string {
  const entries = Object.entries(fields);
  const [path, message] = entries[0] ?? ['_', 'Invalid input'];
  const first = path === '_' ? message : `${path}: ${message}`;
  return entries.length > 1 ? `${first} (and ${entries.length - 1} more)` : first;
}

interface BodyParserError {
  type?: string;
  status?: number;
}

function translate(error: unknown): HttpError {
  if (error instanceof HttpError) return error;
  if (error instanceof ZodError) {
    const fields = zodFields(error);
    return new HttpError(400, zodMessage(fields), { fields });
  }
  // Express cannot decode a parameter such as `%ZZ` in `/api/robots/%ZZ`.
  if (error instanceof URIError) {
    return new HttpError(400, 'The address has a malformed percent-encoding', { code: 'bad_address' });
  }
  if (error instanceof GateFullError) {
    return new HttpError(503, 'The server is busy with other sign-ins; try again in a few seconds', { code: 'busy' });
  }
  const parserError = error as BodyParserError;
  if (parserError?.type === 'entity.too.large') {
    return new HttpError(413, 'The request body is too large');
  }
  if (parserError?.type === 'entity.parse.failed') {
    return new HttpError(400, 'The request body is not valid JSON', { code: 'malformed_json' });
  }
  if (parserError?.type && typeof parserError.status === 'number' && parserError.status < 500) {
    return new HttpError(parserError.status, 'The request body could not be read', { code: 'bad_body' });
  }
  return new HttpError(500, 'Something went wrong on the server');
}

/** The one place errors become responses: `{ error: { code, message, fields?, ...details } }`. */
export const errorHandler: ErrorRequestHandler = (error, _req, res, next) => {
  if (res.headersSent) return next(error);
  const httpError = translate(error);
  if (httpError.status >= 500 && httpError.status !== 503) console.error(error);
  // Busy answers say when to come back, so well-behaved clients do not hammer the server.
  if (httpError.status === 503) res.set('Retry-After', '5');
  res.status(httpError.status).json({
    error: {
      ...httpError.details,
      code: httpError.code,
      message: httpError.message,
      ...(httpError.fields ? { fields: httpError.fields } : {}),
    },
  });
};

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, `No API route ${req.method} ${req.originalUrl.split('?')[0]}`));
};
