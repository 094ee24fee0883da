import { z } from 'zod';
import type { FilesDiff } from '../history/file-diff';
import type { SettingChange } from '../history/setting-changes';
import type { RevisionSummary } from './robots';
import type { FlashEntry } from './flash-log';

/** A revision number in a body, query or path, named by `label` in the reasons. */
export const revisionNumber = (label: string) =>
  z.coerce
    .number({ error: `${label} must be a revision number` })
    .int(`${label} must be a whole number`)
    .min(1, 'Revisions start at 1');

/** The `:revision` of a route path. */
export const RevisionParamSchema = z.object({ revision: revisionNumber('Revision') });

/** A short note beside a restore or a flash. */
export const NoteSchema = z.string({ error: 'The note must be text' }).trim().max(500, 'At most 500 characters');

/** Restoring copies an old revision into a new one, on top of the head the person saw. */
export const RestoreInputSchema = z.object({
  baseRevision: revisionNumber('baseRevision'),
  note: NoteSchema.optional(),
});
export type RestoreInput = z.input<typeof RestoreInputSchema>;

export const DiffQuerySchema = z.object({ from: revisionNumber('from'), to: revisionNumber('to') });

export interface ProblemCount {
  errors: number;
  warnings: number;
}

export interface HistoryEntry extends RevisionSummary {
  problems: ProblemCount;
  /** Every time this revision was recorded as flashed, newest first. */
  flashes: Pick<FlashEntry, 'flashedAt' | 'flashedByName'>[];
}

export interface RobotHistory {
  headRevision: number;
  revisions: HistoryEntry[];
  /** The newest flash log line, which says what is on the robot now. */
  lastFlash: FlashEntry | null;
}

export interface RevisionDiff {
  from: RevisionSummary;
  to: RevisionSummary;
  settings: SettingChange[];
  /**
   * The generated firmware files side by side. `available: false` with a reason when the
   * generator is not part of this server or a revision cannot be generated.
   */
  files: ({ available: true } & FilesDiff) | { available: false; reason: string };
}
