import type { Db } from '@server/db/client';
import { flashes } from '@server/db/schema';

export function insertFlashRow(
  db: Db,
  input: { robotId: string; revisionNumber: number; flashedAt: Date; flashedBy: string; note: string },
): { id: number } {
  return db.insert(flashes).values(input).returning({ id: flashes.id }).get();
}
