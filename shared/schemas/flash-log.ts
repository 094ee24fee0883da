import { z } from 'zod';
import { NoteSchema, revisionNumber } from './history';

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

export interface FlashEntry {
  id: number;
  revisionNumber: number;
  flashedAt: string;
  flashedByName: string | null;
  note: string;
  createdAt: string;
}
