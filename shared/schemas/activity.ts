import { z } from 'zod';

/** One thing done in a team (or a member's sign-in), as the activity log shows it. */
export interface TeamActivity {
  id: number;
  action: string;
  actorName: string | null;
  target: string | null;
  detail: Record<string, unknown>;
  createdAt: string;
}

export const ACTIVITY_KINDS = ['all', 'sign-ins', 'people', 'robots', 'revisions', 'flashes'] as const;
export type ActivityKind = (typeof ACTIVITY_KINDS)[number];

export const ActivityQuerySchema = z.object({
  kind: z.enum(ACTIVITY_KINDS, { error: `kind must be one of ${ACTIVITY_KINDS.join(', ')}` }).default('all'),
  /** Events older than this id (the last one shown), for the next page. */
  before: z.coerce.number().int().positive().optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
});

export interface ActivityPage {
  events: TeamActivity[];
  /** The `before` for the next, older page; null on the last page. */
  nextBefore: number | null;
}
