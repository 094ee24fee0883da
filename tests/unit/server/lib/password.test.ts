import { describe, expect, it } from 'vitest';
import { DEFAULT_PASSWORD_COST, hashPassword, verifyPassword } from '@server/lib/password';

const cheap = { log2N: 10, r: 8, p: 1 };

describe('password hashing', () => {
  it('verifies the password it hashed', async () => {
    const stored = await hashPassword('correct horse battery', cheap);
    expect(await verifyPassword(stored, 'correct horse battery')).toBe(true);
  });

  it('rejects a different password', async () => {
    const stored = await hashPassword('correct horse battery', cheap);
    expect(await verifyPassword(stored, 'correct horse battery!')).toBe(false);
  });

  it('salts every hash, so one password hashes differently twice', async () => {
    expect(await hashPassword('same words', cheap)).not.toBe(await hashPassword('same words', cheap));
  });

  it('records the cost in the stored form, so older settings keep verifying', async () => {
    const stored = await hashPassword('cost check', { log2N: 11, r: 8, p: 2 });
    expect(stored).toMatch(/^scrypt\$11\$8\$2\$[A-Za-z0-9_-]{22}\$[A-Za-z0-9_-]{43}$/);
    expect(await verifyPassword(stored, 'cost check')).toBe(true);
  });

  it('uses 32 MiB of memory by default (128 · N · r)', async () => {
    const { log2N, r } = DEFAULT_PASSWORD_COST;
    expect(128 * 2 ** log2N * r).toBe(32 * 2 ** 20);
    const stored = await hashPassword('default cost');
    expect(stored.startsWith(`scrypt$${log2N}$${r}$${DEFAULT_PASSWORD_COST.p}$`)).toBe(true);
    expect(await verifyPassword(stored, 'default cost')).toBe(true);
  });

  it('treats the same letters in another Unicode form as the same password', async () => {
    const stored = await hashPassword('Zo\u00eb robot', cheap);
    expect(await verifyPassword(stored, 'Zoe\u0308 robot')).toBe(true);
  });

  it('rejects a malformed stored hash instead of throwing', async () => {
    expect(await verifyPassword('plain-text', 'plain-text')).toBe(false);
    expect(await verifyPassword('scrypt$99$8$1$aa$bb', 'x')).toBe(false);
  });
});
