import { formatAgo, formatDateTime } from '@/lib/format';
import type { TeamActivity } from '@shared/schemas/teams';

function text(value: unknown): string {
  return typeof value === 'string' || typeof value === 'number' ? String(value) : '';
}

/** One sentence per audit event, in the club's words. */
export function describeActivity(event: TeamActivity): string {
  const d = event.detail;
  switch (event.action) {
    case 'team.created':
      return `created the team`;
    case 'invitation.sent':
      return `invited ${text(d.email)} as ${text(d.role)}`;
    case 'invitation.accepted':
      return `joined as ${text(d.role)}`;
    case 'invitation.revoked':
      return `withdrew the invitation to ${text(d.email)}`;
    case 'member.role_changed':
      return `changed ${text(d.name) || 'a member'} from ${text(d.from)} to ${text(d.to)}`;
    case 'member.removed':
      return `removed ${text(d.name) || 'a member'}`;
    case 'member.left':
      return 'left the team';
    case 'robot.created':
      return `created the robot ${text(d.name)}`;
    case 'robot.renamed':
      return `renamed ${text(d.from)} to ${text(d.to)}`;
    case 'revision.saved':
      return `saved revision ${text(d.number)} of ${text(d.name) || 'a robot'}: “${text(d.message)}”`;
    default:
      return event.action.replace(/[._]/g, ' ');
  }
}

export function ActivityList({ events }: { events: TeamActivity[] }) {
  return (
    <ol className="divide-y divide-rule">
      {events.map((event) => (
        <li key={event.id} className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-0.5 py-2.5">
          <span>
            <span className="font-semibold">{event.actorName ?? 'Someone'}</span> {describeActivity(event)}
          </span>
          <time dateTime={event.createdAt} title={formatDateTime(event.createdAt)} className="text-sm text-ink-muted">
            {formatAgo(event.createdAt)}
          </time>
        </li>
      ))}
    </ol>
  );
}
