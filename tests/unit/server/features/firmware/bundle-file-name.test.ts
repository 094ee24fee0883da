import { describe, expect, it } from 'vitest';
import { bundleFileName } from '@server/features/firmware/zip-bundle';

describe('the download name of a bundle', () => {
  it('is the robot name as a lower-case slug with the revision', () => {
    expect(bundleFileName('Greenhouse Cart', 7)).toBe('greenhouse-cart-r7.zip');
  });

  it('keeps only ASCII letters and digits from any name', () => {
    expect(bundleFileName('Gärtner "Kiwi" / v2', 3)).toBe('gartner-kiwi-v2-r3.zip');
  });

  it('falls back to "robot" for a name without letters or digits', () => {
    expect(bundleFileName('★★★', 1)).toBe('robot-r1.zip');
  });
});
