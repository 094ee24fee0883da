import { and, eq, isNull } from 'drizzle-orm';
import type { Db } from '@server/db/client';
import { passwordResetTokens, users, type UserRow } from '@server/db/schema';
import { newId } from '@server/lib/ids';

export function findUserByEmail(db: Db, email: string): UserRow | undefined {
  return db.select().from(users).where(eq(users.email, email.toLowerCase())).get();
}

export function findUserById(db: Db, id: string): UserRow | undefined {
  return db.select().from(users).where(eq(users.id, id)).get();
}

export function insertUser(db: Db, input: { email: string; name: string; passwordHash: string }): UserRow {
  return db
    .insert(users)
    .values({ id: newId(), email: input.email.toLowerCase(), name: input.name, passwordHash: input.passwordHash })
    .returning()
    .get();
}

export function updatePasswordHash(db: Db, userId: string, passwordHash: string): void {
  db.update(users).set({ passwordHash }).where(eq(users.id, userId)).run();
}

/** Removes the person's unused reset links (after a reset, none of them should work any more). */
export function deleteUnusedResetTokens(db: Db, userId: string): void {
  db.delete(passwordResetTokens)
    .where(and(eq(passwordResetTokens.userId, userId), isNull(passwordResetTokens.usedAt)))
    .run();
}

/** Stores a new reset link's hash and removes the person's older unused links: only the newest works. */
export function replaceResetToken(db: Db, input: { tokenHash: string; userId: string; expiresAt: Date }): void {
  db.transaction((tx) => {
    deleteUnusedResetTokens(tx, input.userId);
    tx.insert(passwordResetTokens).values(input).run();
  });
}

/** Marks an unused token used and returns it; undefined when unknown or already used. */
export function consumeResetToken(db: Db, tokenHash: string, now: Date) {
  return db
    .update(passwordResetTokens)
    .set({ usedAt: now })
    .where(and(eq(passwordResetTokens.tokenHash, tokenHash), isNull(passwordResetTokens.usedAt)))
    .returning()
    .get();
}
