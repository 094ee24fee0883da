import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTIONS } from '@shared/safety/cautions';

// The product brief's cautions: each must be present in some wording.
describe('the safety cautions', () => {
  const all = SAFETY_CAUTIONS.join(' ').toLowerCase();
  it.each([
    ['wheels off the ground', /wheels off the ground/],
    ['failsafe checked by switching the remote off', /failsafe.*switching the remote off/],
    ['reachable power switch and a fuse', /power switch.*fuse/],
    ['supervised lithium charging on a fire-safe surface', /lithium.*watches.*fire-safe/],
    ['local radio and vehicle rules', /local rules for radio.*vehicles in public/],
    ['engineering review for ride-on or heavy robots', /ride on.*heavy.*engineering review/],
  ])('mentions %s', (_name, pattern) => {
    expect(all).toMatch(pattern);
  });
});
