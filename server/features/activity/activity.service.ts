import type { AppContext } from '@server/config';
import { HttpError } from '@server/lib/http-error';
import type { ActivityKind, ActivityPage } from '@shared/schemas/activity';
import type { Role } from '@shared/schemas/teams';
import { listTeamActivity } from './activity.repository';

/**
 * One page of the team's activity, newest first. Sign-ins say when each member was around,
 * which is the owners' business only: other members see what was done, not who signed in.
 * Likewise the e-mail addresses of people invited (who may never join): everyone but owners
 * reads "someone".
 */
export function teamActivity(
  ctx: AppContext,
  teamId: string,
  role: Role,
  query: { kind: ActivityKind; before?: number; limit: number },
): ActivityPage {
  const signIns = role === 'owner';
  if (query.kind === 'sign-ins' && !signIns) {
    const reason = 'Only owners see when members signed in';
    throw new HttpError(403, reason, { fields: { kind: reason } });
  }
  const listed = listTeamActivity(ctx.db, teamId, { ...query, signIns });
  const events = role === 'owner' ? listed : listed.map(withoutEmail);
  return { events, nextBefore: events.length === query.limit ? events[events.length - 1].id : null };
}

function withoutEmail<Event extends { detail: Record<string, unknown> }>(event: Event): Event {
  if (!('email' in event.detail)) return event;
  const { email: _email, ...detail } = event.detail;
  return { ...event, detail };
}
