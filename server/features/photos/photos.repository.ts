import { eq } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { robotPhotos } from '@server/db/schema';

export type PhotoRow = typeof robotPhotos.$inferSelect;

export function findPhoto(db: Db, robotId: string): PhotoRow | undefined {
  return db.select().from(robotPhotos).where(eq(robotPhotos.robotId, robotId)).get();
}

export function upsertPhoto(db: Db, row: Omit<PhotoRow, 'createdAt'>): void {
  const createdAt = new Date();
  db.insert(robotPhotos)
    .values({ ...row, createdAt })
    .onConflictDoUpdate({
      target: robotPhotos.robotId,
      set: { fileName: row.fileName, mimeType: row.mimeType, bytes: row.bytes, uploadedBy: row.uploadedBy, createdAt },
    })
    .run();
}

export function deletePhoto(db: Db, robotId: string): void {
  db.delete(robotPhotos).where(eq(robotPhotos.robotId, robotId)).run();
}
