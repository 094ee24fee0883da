import { describe, expect, it } from 'vitest';
import { createBundleCache } from '@server/features/firmware/bundle-cache';

const key = (revision: number, generatorVersion = '1.0.0') => ({ robotId: 'robot-1', revision, generatorVersion });

describe('the bundle cache', () => {
  it('renders a revision once, however many ask at the same time', async () => {
    const cache = createBundleCache<string>(10);
    let renders = 0;
    const make = async () => `zip ${++renders}`;
    const answers = await Promise.all([1, 2, 3].map(() => cache.get(key(4), make)));
    expect(answers).toEqual(['zip 1', 'zip 1', 'zip 1']);
    expect(await cache.get(key(4), make)).toBe('zip 1');
    expect(renders).toBe(1);
  });

  it('renders again for another revision or another generator version', async () => {
    const cache = createBundleCache<string>(10);
    let renders = 0;
    const make = async () => `zip ${++renders}`;
    await cache.get(key(4), make);
    expect(await cache.get(key(5), make)).toBe('zip 2');
    expect(await cache.get(key(4, '1.1.0'), make)).toBe('zip 3');
  });

  it('forgets a render that failed', async () => {
    const cache = createBundleCache<string>(10);
    await expect(cache.get(key(4), async () => Promise.reject(new Error('blocked')))).rejects.toThrow('blocked');
    await Promise.resolve();
    expect(await cache.get(key(4), async () => 'zip')).toBe('zip');
  });

  it('keeps at most its limit, dropping the least recently used', async () => {
    const cache = createBundleCache<string>(2);
    await cache.get(key(1), async () => 'one');
    await cache.get(key(2), async () => 'two');
    await cache.get(key(1), async () => 'again');
    await cache.get(key(3), async () => 'three');
    expect(cache.size).toBe(2);
    expect(await cache.get(key(1), async () => 'new one')).toBe('one');
    expect(await cache.get(key(2), async () => 'new two')).toBe('new two');
  });
});
