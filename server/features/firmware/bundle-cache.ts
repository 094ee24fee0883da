/**
 * Rendered bundles kept by robot, revision and generator version. A revision never changes
 * once saved, so its bundle is rendered and zipped once (by whoever asks first; others asking
 * meanwhile wait for that same work) and then served from memory, the newest-used first.
 */
export interface BundleCache<T> {
  get: (key: { robotId: string; revision: number; generatorVersion: string }, make: () => Promise<T>) => Promise<T>;
  readonly size: number;
}

export function createBundleCache<T>(limit: number): BundleCache<T> {
  const entries = new Map<string, Promise<T>>();
  return {
    get size() {
      return entries.size;
    },
    get(key, make) {
      const id = `${key.robotId}\u0000${key.revision}\u0000${key.generatorVersion}`;
      const found = entries.get(id);
      if (found) {
        // Map order is use order: move it to the end.
        entries.delete(id);
        entries.set(id, found);
        return found;
      }
      const made = make();
      entries.set(id, made);
      // A failed render (a revision the generator refuses) is not kept: the answer may change
      // with the next generator, and errors are cheap to produce again.
      made.catch(() => entries.delete(id));
      while (entries.size > limit) entries.delete(entries.keys().next().value!);
      return made;
    },
  };
}
