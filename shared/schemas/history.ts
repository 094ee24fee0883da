import { z } from 'zod';
import type { FilesDiff } from '../history/file-diff';
import type { SettingChange } from '../history/setting-changes';
import type { RevisionSummary } from './robots';

const revisionNumber = (label: string) =>
  z.coerce
    .number({ error: `${label} must be a revision number` })
    .int(`${label} must be a whole number`)
    .min(1, 'Revisions start at 1');

const NoteSchema = z.string({ error: 'The note must be text' }).trim().max(500, 'At most 500 characters');

/** Restoring copies an old revision into a new one, on top of the head the person saw. */
export const RestoreInputSchema = z.object({
  baseRevision: revisionNumber('baseRevision'),
  note: NoteSchema.optional(),
});
export type RestoreInput = z.input<typeof RestoreInputSchema>;

export const DiffQuerySchema = z.object({ from: revisionNumber('from'), to: revisionNumber('to') });

/** A line in the flash log: revision N went onto the robot. */
export const RecordFlashInputSchema = z.object({
  revision: revisionNumber('revision'),
  /** When it was flashed (ISO date-time); now when left out. */
  flashedAt: z.iso
    .datetime({ offset: true, error: 'flashedAt must be a date and time, e.g. 2026-03-14T16:05:00Z' })
    .max(40, 'flashedAt must be a date and time, e.g. 2026-03-14T16:05:00Z')
    .optional(),
  note: NoteSchema.default(''),
});
export type RecordFlashInput = z.input<typeof RecordFlashInputSchema>;

export const BootLineInputSchema = z.object({
  line: z
    .string({ error: 'Paste the boot line' })
    .trim()
    .min(1, 'Paste the boot line')
    .max(4000, 'At most 4000 characters'),
});
export type BootLineInput = z.input<typeof BootLineInputSchema>;

/** Fields sent with an uploaded file (multipart form fields arrive as text). */
export const ImportRobotFieldsSchema = z.object({
  /** Name for the new robot; the file's own name when left out. */
  name: z.string().trim().max(60, 'At most 60 characters').optional(),
  message: z.string().trim().max(500, 'At most 500 characters').optional(),
});

export const ImportRevisionFieldsSchema = z.object({
  baseRevision: revisionNumber('baseRevision'),
  message: z.string().trim().max(500, 'At most 500 characters').optional(),
});

export interface ProblemCount {
  errors: number;
  warnings: number;
}

export interface FlashEntry {
  id: number;
  revisionNumber: number;
  flashedAt: string;
  flashedByName: string | null;
  note: string;
  createdAt: string;
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

export type BootLineMatch = {
  number: number;
  message: string;
  createdAt: string;
  isHead: boolean;
};

export interface BootLineAnswer {
  parsed: { device: 'robot' | 'remote'; robotName: string; revision: number; hash: string };
  /** The revision whose configuration has the printed hash (the printed number first), or null. */
  match: BootLineMatch | null;
  /** Other revisions with the same configuration (a restore copies one). */
  sameConfiguration: number[];
  headRevision: number;
  /** One or two sentences for the person at the bench. */
  verdict: string;
  /** Whether the robot name in the line is this robot's name. */
  nameMatches: boolean;
}

/** Which of a team's robots a pasted boot line belongs to. */
export interface TeamBootLineAnswer {
  parsed: BootLineAnswer['parsed'];
  /** The robot the line belongs to, or null when no robot in the team matches. */
  robot: { id: string; name: string } | null;
  /** How the robot was found: a revision with the printed hash, or only the printed name. */
  foundBy: 'hash' | 'name' | null;
  /** The same answer the robot's own lookup gives, or null with no robot. */
  answer: BootLineAnswer | null;
  /** Other robots of the team with a revision of the same configuration (a copied robot). */
  otherRobots: { id: string; name: string }[];
  /** One sentence on how the robot was found, or why none was. */
  verdict: string;
}

export interface ImportAnswer {
  robotId: string;
  revision: number;
  fromVersion: number;
  /** What the migration changed, and what kind of file it was. */
  notes: string[];
}

export interface BinnedRobot {
  id: string;
  name: string;
  headRevision: number;
  deletedAt: string;
  deletedByName: string | null;
  /** After this moment the robot can no longer be restored. */
  restorableUntil: string;
}

export const AUDIT_KINDS = ['all', 'sign-ins', 'people', 'robots', 'revisions', 'flashes'] as const;
export const AuditQuerySchema = z.object({
  kind: z.enum(AUDIT_KINDS, { error: `kind must be one of ${AUDIT_KINDS.join(', ')}` }).default('all'),
  /** Events older than this id (the last one shown), for the next page. */
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});
export type AuditKind = (typeof AUDIT_KINDS)[number];
