import { useOutletContext } from 'react-router';
import { Panel } from '@/components/ui/panel';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { useMe } from '@/features/auth/api/get-me';
import { useInvitations } from '@/features/teams/api/get-invitations';
import { useMembers } from '@/features/teams/api/get-members';
import { InvitationsList } from '@/features/teams/components/invitations-list';
import { InviteForm } from '@/features/teams/components/invite-form';
import { MembersTable } from '@/features/teams/components/members-table';
import { errorMessage } from '@/lib/api-client';
import { ROLES, ROLE_SUMMARIES, type TeamDetail } from '@shared/schemas/teams';

export function TeamPeopleRoute() {
  const team = useOutletContext<TeamDetail>();
  const members = useMembers(team.id);
  const me = useMe();
  const isOwner = team.role === 'owner';
  const delivery = useInvitations(team.id, isOwner).data?.delivery;

  return (
    <div className="grid items-start gap-6 lg:grid-cols-[1fr_20rem]">
      <div className="flex flex-col gap-6">
        <Panel title="Members" titleId="members-title">
          {members.isPending && <LoadingState label="Loading members…" />}
          {members.isError && <ErrorState message={errorMessage(members.error)} onRetry={() => members.refetch()} />}
          {members.data && me.data && (
            <MembersTable
              teamId={team.id}
              teamName={team.name}
              members={members.data}
              myRole={team.role}
              myUserId={me.data.id}
            />
          )}
        </Panel>
        {isOwner && (
          <Panel
            title="Invite someone"
            titleId="invite-title"
            description={
              delivery === 'by-hand'
                ? 'You get a one-time link that works for 7 days, to pass on yourself.'
                : 'They get an e-mail with a one-time link that works for 7 days.'
            }
          >
            <InviteForm teamId={team.id} delivery={delivery} />
          </Panel>
        )}
        {isOwner && (
          <Panel title="Open invitations" titleId="open-invitations-title">
            <InvitationsList teamId={team.id} />
          </Panel>
        )}
      </div>
      <Panel title="Roles" titleId="roles-title">
        <dl className="flex flex-col gap-3 text-sm">
          {ROLES.map((role) => (
            <div key={role}>
              <dt className="font-semibold capitalize">{role}</dt>
              <dd className="text-ink-muted">{ROLE_SUMMARIES[role]}.</dd>
            </div>
          ))}
        </dl>
        <p className="mt-4 text-sm text-ink-muted">A team always keeps at least one owner.</p>
      </Panel>
    </div>
  );
}
