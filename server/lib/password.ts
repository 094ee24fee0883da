import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from 'node:crypto';
import { availableParallelism } from 'node:os';
import { createConcurrencyGate } from './concurrency-gate';

/**
 * Password hashing with scrypt (memory-hard), see docs/decisions/001-password-hashing.md.
 *
 * Default cost N = 2^15, r = 8, p = 3: 128·N·r = 32 MiB of memory per hash, three passes.
 * This is one of the equivalent scrypt settings in the OWASP Password Storage Cheat Sheet
 * (section "scrypt"; the list of N/r/p combinations is from memory). `npm run bench --
 * password-hash` prints how long one hash takes on this machine.
 *
 * Stored form: `scrypt$<log2 N>$<r>$<p>$<salt, base64url>$<key, base64url>`, so old hashes still
 * verify after the defaults change, and tests can use a cheaper setting without a second format.
 */
export interface PasswordCost {
  log2N: number;
  r: number;
  p: number;
}

export const DEFAULT_PASSWORD_COST: PasswordCost = { log2N: 15, r: 8, p: 3 };

const KEY_LENGTH = 32;
const SALT_BYTES = 16;

/**
 * Every hash in this process goes through one gate: half the cores at most, and a short wait
 * beyond which a sign-in is refused as busy (GateFullError) rather than queued for seconds. A
 * burst of sign-ins then slows sign-ins, not the rest of the app.
 */
const HASHES_AT_ONCE = Math.max(1, Math.floor(availableParallelism() / 2));
export const passwordHashGate = createConcurrencyGate({ maxRunning: HASHES_AT_ONCE, maxWaiting: 8 * HASHES_AT_ONCE });

function deriveKey(password: string, salt: Buffer, cost: PasswordCost): Promise<Buffer> {
  return passwordHashGate.run(() => scryptKey(password, salt, cost));
}

function scryptKey(password: string, salt: Buffer, cost: PasswordCost): Promise<Buffer> {
  const N = 2 ** cost.log2N;
  // Node refuses to use more than `maxmem`; allow the 128·N·r the setting needs plus headroom.
  const options: ScryptOptions = { N, r: cost.r, p: cost.p, maxmem: 128 * N * cost.r * 2 };
  return new Promise((resolve, reject) => {
    scrypt(password.normalize('NFKC'), salt, KEY_LENGTH, options, (error, key) =>
      error ? reject(error) : resolve(key),
    );
  });
}

export async function hashPassword(password: string, cost: PasswordCost = DEFAULT_PASSWORD_COST): Promise<string> {
  const salt = randomBytes(SALT_BYTES);
  const key = await deriveKey(password, salt, cost);
  return ['scrypt', cost.log2N, cost.r, cost.p, salt.toString('base64url'), key.toString('base64url')].join('$');
}

export async function verifyPassword(stored: string, password: string): Promise<boolean> {
  const parts = stored.split('$');
  if (parts.length !== 6 || parts[0] !== 'scrypt') return false;
  const [log2N, r, p] = parts.slice(1, 4).map(Number);
  if (![log2N, r, p].every((n) => Number.isInteger(n) && n > 0) || log2N > 20) return false;
  const expected = Buffer.from(parts[5], 'base64url');
  const key = await deriveKey(password, Buffer.from(parts[4], 'base64url'), { log2N, r, p });
  return key.length === expected.length && timingSafeEqual(key, expected);
}
