import { isIP } from 'node:net';
import type { Request, RequestHandler } from 'express';
import { HttpError } from '@server/lib/http-error';

/** 127.0.0.0/8, ::1 and IPv4 loopback written as IPv6 (`::ffff:127.0.0.1`). */
export function isLoopbackAddress(address: string | undefined): boolean {
  if (!address) return false;
  const plain = address.replace(/^::ffff:/i, '');
  if (isIP(plain) === 4) return plain.startsWith('127.');
  return plain === '::1' || plain === '0:0:0:0:0:0:0:1';
}

/** A host name (or `Host` header, with or without a port) that names this machine only. */
export function isLoopbackHost(host: string | undefined): boolean {
  if (!host) return false;
  const match = /^\[([^\]]+)\](?::\d+)?$/.exec(host) ?? /^([^:]+)(?::\d+)?$/.exec(host);
  const name = (match?.[1] ?? host).toLowerCase();
  return name === 'localhost' || name.endsWith('.localhost') || isLoopbackAddress(name);
}

const PROXY_HEADERS = ['x-forwarded-for', 'x-forwarded-host', 'forwarded', 'x-real-ip'];

/**
 * True only for a request made on this machine: from a loopback address (the socket's own, not
 * one a proxy claims), to a loopback host name, and not relayed by a proxy. A proxy on the same
 * machine connects from loopback for every visitor, so its headers give it away.
 */
export function isLocalRequest(req: Pick<Request, 'socket' | 'headers'>): boolean {
  return (
    isLoopbackAddress(req.socket.remoteAddress) &&
    isLoopbackHost(req.headers.host) &&
    !PROXY_HEADERS.some((header) => req.headers[header] !== undefined)
  );
}

/** Lets only requests made on this machine through (see `isLocalRequest`). */
export function localRequestsOnly(what: string): RequestHandler {
  return (req, _res, next) => {
    if (isLocalRequest(req)) return next();
    next(
      new HttpError(403, `The ${what} can be read only on the machine running Mixwright, at a localhost address`, {
        code: 'local_only',
      }),
    );
  };
}
