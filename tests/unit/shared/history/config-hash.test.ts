import { createHash } from 'node:crypto';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { canonicalJson, configHash } from '@shared/history/config-hash';
import { sha256Hex } from '@shared/history/sha256';
import { robotConfig } from '../../../factories/robot-config';

describe('SHA-256', () => {
  // Test vectors: NIST FIPS 180-4 examples (csrc.nist.gov "Example Algorithms", SHA256.pdf):
  // one-block "abc" and the two-block 448-bit message; the empty string from the same family.
  it('gives the published digest of "abc"', () => {
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });

  it('gives the published digest of the two-block message', () => {
    expect(sha256Hex('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe(
      '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1',
    );
  });

  it('gives the published digest of the empty message', () => {
    expect(sha256Hex('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });

  it('agrees with Node’s crypto on any text, at every length around the block edges', () => {
    const node = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');
    for (let n = 50; n < 140; n++) expect(sha256Hex('x'.repeat(n))).toBe(node('x'.repeat(n)));
    fc.assert(fc.property(fc.string({ unit: 'grapheme', maxLength: 300 }), (text) => sha256Hex(text) === node(text)));
  });
});

describe('the configuration hash', () => {
  it('is the first 8 hex digits of SHA-256 over the canonical JSON', () => {
    const config = robotConfig();
    expect(configHash(config)).toBe(createHash('sha256').update(canonicalJson(config)).digest('hex').slice(0, 8));
  });

  it('does not depend on the order of keys', () => {
    expect(canonicalJson({ b: 1, a: { d: [1, { z: 1, y: 2 }], c: null } })).toBe(
      '{"a":{"c":null,"d":[1,{"y":2,"z":1}]},"b":1}',
    );
    const config = robotConfig();
    const reordered = Object.fromEntries(Object.entries(config).reverse());
    expect(configHash(reordered)).toBe(configHash(config));
  });

  it('changes when any setting changes', () => {
    const config = robotConfig();
    const changed = robotConfig({ safety: { failsafeTimeoutMs: 251 } });
    expect(configHash(changed)).not.toBe(configHash(config));
  });
});
