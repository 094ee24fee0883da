import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { hashToken, newId, newToken } from '@server/lib/ids';

describe('ids and link tokens', () => {
  it('makes URL-safe ids of 96 bits', () => {
    expect(newId()).toMatch(/^[A-Za-z0-9_-]{16}$/);
  });

  it('makes link tokens of 256 bits that do not repeat', () => {
    const tokens = new Set(Array.from({ length: 100 }, newToken));
    expect(tokens.size).toBe(100);
    for (const token of tokens) expect(Buffer.from(token, 'base64url')).toHaveLength(32);
  });

  it('stores SHA-256 of a token, as Node computes it', () => {
    expect(hashToken('abc')).toBe(createHash('sha256').update('abc').digest('hex'));
    expect(hashToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});
