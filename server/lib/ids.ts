import { createHash, randomBytes } from 'node:crypto';

/** A random id for rows people may see in addresses: 96 bits, URL-safe, not guessable. */
export function newId(): string {
  return randomBytes(12).toString('base64url');
}

/** A secret for a one-time link: 256 bits, URL-safe. Only its hash is stored. */
export function newToken(): string {
  return randomBytes(32).toString('base64url');
}

/**
 * SHA-256 of a link token. A fast hash is enough here because the token is 256 random bits,
 * not a password: a stolen database row cannot be turned back into a working link.
 */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
