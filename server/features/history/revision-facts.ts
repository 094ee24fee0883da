import { configHash } from '@shared/history/config-hash';
import { robotProblems } from '@shared/problems/robot-problems';
import type { ProblemCount } from '@shared/schemas/history';
import { parseAnyVersion } from '@shared/schemas/migrate-config';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { StoredRevision } from './history.repository';

/** What the history needs to know about a revision, worked out once from its configuration. */
export interface RevisionFacts {
  /** The configuration in the current schema version, defaults filled. */
  config: RobotConfig;
  problems: ProblemCount;
  /**
   * Configuration hashes that firmware built from this revision may print: the hash of the
   * configuration as read today and, if a schema migration changed it, as it was stored.
   */
  hashes: string[];
}

// Revisions never change, so their facts can be kept; keyed by the row id, unique across robots.
// Bounded so a long-running server does not grow without end.
const MAX_CACHED = 2000;
const cache = new Map<number, RevisionFacts>();

function workOut(revision: StoredRevision): RevisionFacts {
  const stored = JSON.parse(revision.configText) as unknown;
  const config = parseAnyVersion(stored);
  const problems = robotProblems(config);
  const hashes = [...new Set([configHash(config), configHash(stored)])];
  return {
    config,
    problems: {
      errors: problems.filter((p) => p.severity === 'error').length,
      warnings: problems.filter((p) => p.severity === 'warning').length,
    },
    hashes,
  };
}

export function revisionFacts(revision: StoredRevision): RevisionFacts {
  const known = cache.get(revision.id);
  if (known) return known;
  const facts = workOut(revision);
  if (cache.size >= MAX_CACHED) cache.delete(cache.keys().next().value!);
  cache.set(revision.id, facts);
  return facts;
}
