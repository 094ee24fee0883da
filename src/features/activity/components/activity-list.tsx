import { formatAgo, formatDateTime } from '@/lib/format';
import type { TeamActivity } from '@shared/schemas/activity';

function text(value: unknown): string {
  return typeof value === 'string' || typeof value === 'number' ? String(value) : '';
}

/** One sentence per activity event, in the club's words. */
export function describeActivity(event: TeamActivity): string {
  const d = event.detail;
  switch (event.action) {
    case 'team.created':
      return `created the team`;
    case 'invitation.sent':
      // Only owners are shown whom an invitation went to.
      return `invited ${text(d.email) || 'someone'} as ${text(d.role)}`;
    case 'invitation.accepted':
      return `joined as ${text(d.role)}`;
    case 'invitation.revoked':
      return d.email ? `withdrew the invitation to ${text(d.email)}` : 'withdrew an invitation';
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
    case 'revision.restored':
      return `restored revision ${text(d.from)} of ${text(d.name) || 'a robot'} as revision ${text(d.number)}${text(d.note) ? `: “${text(d.note)}”` : ''}`;
    case 'revision.imported':
      return `imported ${text(d.file)} as revision ${text(d.number)} of ${text(d.name) || 'a robot'}`;
    case 'robot.imported':
      return `imported the robot ${text(d.name)} from ${text(d.file)}`;
    case 'robot.deleted':
      return `moved the robot ${text(d.name)} to the bin`;
    case 'robot.restored':
      return `restored the robot ${text(d.name)} from the bin`;
    case 'robot.purged':
      return `removed the robot ${text(d.name)} for good, ${text(d.afterDays)} days after it was deleted`;
    case 'flash.recorded':
      return `flashed revision ${text(d.number)} onto ${text(d.name) || 'a robot'}${text(d.note) ? `: “${text(d.note)}”` : ''}`;
    case 'photo.uploaded':
      return `uploaded a photo of ${text(d.name)}`;
    case 'photo.removed':
      return `removed the photo of ${text(d.name)}`;
    case 'user.signed_in':
      return 'signed in';
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
            <span className="font-semibold">
              {event.actorName ?? (event.action === 'robot.purged' ? 'Mixwright' : 'Someone')}
            </span>{' '}
            {describeActivity(event)}
          </span>
          <time dateTime={event.createdAt} title={formatDateTime(event.createdAt)} className="text-sm text-ink-muted">
            {formatAgo(event.createdAt)}
          </time>
        </li>
      ))}
    </ol>
  );
}
