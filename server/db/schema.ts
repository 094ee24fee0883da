import { sql } from 'drizzle-orm';
import { index, integer, primaryKey, sqliteTable, text, uniqueIndex } from 'drizzle-orm/sqlite-core';

// Times are stored as Unix milliseconds (`timestamp_ms`), except the session expiry, which the
// session library reads and writes as plain Unix seconds.
const createdAt = () =>
  integer('created_at', { mode: 'timestamp_ms' })
    .notNull()
    .default(sql`(unixepoch() * 1000)`)
    .$defaultFn(() => new Date());

export const users = sqliteTable('users', {
  id: text('id').primaryKey(),
  /** Stored lower-cased; compared lower-cased. */
  email: text('email').notNull().unique(),
  name: text('name').notNull(),
  passwordHash: text('password_hash').notNull(),
  createdAt: createdAt(),
});

export const sessions = sqliteTable(
  'sessions',
  {
    id: text('id').primaryKey(),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    expiresAt: integer('expires_at').notNull(),
  },
  (t) => [index('sessions_user_idx').on(t.userId)],
);

export const teams = sqliteTable('teams', {
  id: text('id').primaryKey(),
  name: text('name').notNull(),
  createdBy: text('created_by').references(() => users.id),
  createdAt: createdAt(),
});

export const ROLE_VALUES = ['owner', 'editor', 'viewer'] as const;

export const memberships = sqliteTable(
  'memberships',
  {
    teamId: text('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    role: text('role', { enum: ROLE_VALUES }).notNull(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.teamId, t.userId] }), index('memberships_user_idx').on(t.userId)],
);

export const invitations = sqliteTable(
  'invitations',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: text('role', { enum: ROLE_VALUES }).notNull(),
    /** SHA-256 of the token in the link; the token itself is never stored. */
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by')
      .notNull()
      .references(() => users.id),
    createdAt: createdAt(),
    expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
    acceptedAt: integer('accepted_at', { mode: 'timestamp_ms' }),
    acceptedBy: text('accepted_by').references(() => users.id),
    revokedAt: integer('revoked_at', { mode: 'timestamp_ms' }),
  },
  (t) => [index('invitations_team_idx').on(t.teamId)],
);

export const passwordResetTokens = sqliteTable('password_reset_tokens', {
  tokenHash: text('token_hash').primaryKey(),
  userId: text('user_id')
    .notNull()
    .references(() => users.id, { onDelete: 'cascade' }),
  createdAt: createdAt(),
  expiresAt: integer('expires_at', { mode: 'timestamp_ms' }).notNull(),
  usedAt: integer('used_at', { mode: 'timestamp_ms' }),
});

export const auditEvents = sqliteTable(
  'audit_events',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    /** Null for events outside any team (sign-ins, password resets). */
    teamId: text('team_id').references(() => teams.id, { onDelete: 'cascade' }),
    actorId: text('actor_id').references(() => users.id, { onDelete: 'set null' }),
    action: text('action').notNull(),
    /** What the action was done to, as `kind:id` (for example `robot:abc`, `user:xyz`). */
    target: text('target'),
    /** JSON text with the action's particulars. */
    detail: text('detail').notNull().default('{}'),
    createdAt: createdAt(),
  },
  (t) => [index('audit_team_idx').on(t.teamId, t.createdAt)],
);

export const robots = sqliteTable(
  'robots',
  {
    id: text('id').primaryKey(),
    teamId: text('team_id')
      .notNull()
      .references(() => teams.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    createdBy: text('created_by').references(() => users.id),
    createdAt: createdAt(),
    /** Set when a robot is moved to the bin; such robots are hidden everywhere. */
    deletedAt: integer('deleted_at', { mode: 'timestamp_ms' }),
    /** Who moved it to the bin. */
    deletedBy: text('deleted_by').references(() => users.id, { onDelete: 'set null' }),
    /** Number of the newest revision (revisions are numbered 1, 2, 3… per robot). */
    headRevision: integer('head_revision').notNull().default(0),
  },
  (t) => [index('robots_team_idx').on(t.teamId)],
);

export const revisions = sqliteTable(
  'revisions',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    robotId: text('robot_id')
      .notNull()
      .references(() => robots.id, { onDelete: 'cascade' }),
    number: integer('number').notNull(),
    /** The robot configuration as JSON text, checked against RobotConfigSchema before it is stored. */
    config: text('config').notNull(),
    message: text('message').notNull(),
    authorId: text('author_id').references(() => users.id),
    createdAt: createdAt(),
  },
  (t) => [uniqueIndex('revisions_robot_number_idx').on(t.robotId, t.number)],
);

export const flashes = sqliteTable(
  'flashes',
  {
    id: integer('id').primaryKey({ autoIncrement: true }),
    robotId: text('robot_id')
      .notNull()
      .references(() => robots.id, { onDelete: 'cascade' }),
    revisionNumber: integer('revision_number').notNull(),
    flashedAt: integer('flashed_at', { mode: 'timestamp_ms' }).notNull(),
    flashedBy: text('flashed_by').references(() => users.id),
    note: text('note').notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [index('flashes_robot_idx').on(t.robotId, t.flashedAt)],
);

/** A robot's photo: the file lives under DATA_DIR/photos with a random name; one per robot. */
export const robotPhotos = sqliteTable('robot_photos', {
  robotId: text('robot_id')
    .primaryKey()
    .references(() => robots.id, { onDelete: 'cascade' }),
  /** Random file name (hex + extension) inside the photos folder; never taken from the upload. */
  fileName: text('file_name').notNull(),
  /** Read from the file's content, not from what the browser claimed. */
  mimeType: text('mime_type', { enum: ['image/jpeg', 'image/png', 'image/webp'] }).notNull(),
  bytes: integer('bytes').notNull(),
  uploadedBy: text('uploaded_by').references(() => users.id, { onDelete: 'set null' }),
  createdAt: createdAt(),
});

export type UserRow = typeof users.$inferSelect;
export type TeamRow = typeof teams.$inferSelect;
export type RobotRow = typeof robots.$inferSelect;
export type RevisionRow = typeof revisions.$inferSelect;
export type InvitationRow = typeof invitations.$inferSelect;
