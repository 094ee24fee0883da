import { z } from 'zod';
import { revisionNumber } from './history';

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

export interface ImportAnswer {
  robotId: string;
  revision: number;
  fromVersion: number;
  /** What the migration changed, and what kind of file it was. */
  notes: string[];
}
