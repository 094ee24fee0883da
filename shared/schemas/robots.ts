import { z } from 'zod';
import type { BoardId, ChassisLayout } from './ids';
import { RobotConfigSchema, RobotNameSchema, type RobotConfig } from './robot-config';

export const RevisionMessageSchema = z
  .string({ error: 'Say what changed' })
  .trim()
  .min(1, 'Say what changed')
  .max(500, 'At most 500 characters');

export const CreateRobotInputSchema = z.object({
  name: RobotNameSchema,
  config: RobotConfigSchema,
  message: RevisionMessageSchema.optional(),
});
export type CreateRobotInput = z.input<typeof CreateRobotInputSchema>;

export const SaveRevisionInputSchema = z.object({
  /** The revision the edit started from; saving fails with 409 when someone saved after it. */
  baseRevision: z.number({ error: 'baseRevision must be a revision number' }).int().min(1),
  message: RevisionMessageSchema,
  config: RobotConfigSchema,
});
export type SaveRevisionInput = z.input<typeof SaveRevisionInputSchema>;

export const RenameRobotInputSchema = z.object({ name: RobotNameSchema });
export type RenameRobotInput = z.input<typeof RenameRobotInputSchema>;

export interface RevisionSummary {
  number: number;
  message: string;
  authorName: string | null;
  createdAt: string;
}

export interface RevisionDetail extends RevisionSummary {
  config: RobotConfig;
}

export interface RobotSummary {
  id: string;
  teamId: string;
  name: string;
  createdAt: string;
  headRevision: number;
  updatedAt: string;
  lastFlash: { revisionNumber: number; flashedAt: string } | null;
  /** Where the robot's photo is served (team members only), or null without one. */
  photoUrl: string | null;
}

/** A robot as the team dashboard lists it: the summary plus facts of its head revision. */
export interface RobotListItem extends RobotSummary {
  /** Null when the head revision could not be read (a file from an unknown format). */
  layout: ChassisLayout | null;
  board: BoardId | null;
  /** Open problems of the head revision (the same list the editor shows). */
  problems: { errors: number; warnings: number } | null;
}

export interface RobotDetail {
  robot: RobotSummary & { teamName: string; role: 'owner' | 'editor' | 'viewer' };
  head: RevisionDetail;
}

/**
 * The payload of a 409 when a revision was saved on top of an older one: the newer head in
 * full, and the draft that was not saved (given back so it is never lost).
 */
export interface RevisionConflict {
  code: 'revision_conflict';
  message: string;
  head: RevisionDetail;
  draft: { baseRevision: number; message: string; config: RobotConfig };
}
