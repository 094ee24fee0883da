import { useNavigate } from 'react-router';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { TBody, THead, Table, Td, Th, Tr } from '@/components/ui/table';
import { inputClasses } from '@/components/ui/text-field';
import { cx } from '@/components/ui/cx';
import { errorMessage } from '@/lib/api-client';
import { formatDate } from '@/lib/format';
import { ROLES, type Role, type TeamMember } from '@shared/schemas/teams';
import { useChangeMemberRole } from '../api/change-member-role';
import { useRemoveMember } from '../api/remove-member';

interface Props {
  teamId: string;
  teamName: string;
  members: TeamMember[];
  myRole: Role;
  myUserId: string;
}

export function MembersTable({ teamId, teamName, members, myRole, myUserId }: Props) {
  const changeRole = useChangeMemberRole(teamId);
  const remove = useRemoveMember(teamId);
  const navigate = useNavigate();
  const isOwner = myRole === 'owner';
  const failure = changeRole.error ?? remove.error;

  function onRemove(member: TeamMember) {
    const leaving = member.userId === myUserId;
    const question = leaving
      ? `Leave ${teamName}? You will lose access to its robots.`
      : `Remove ${member.name} from ${teamName}?`;
    if (!window.confirm(question)) return;
    remove.mutate(member.userId, { onSuccess: () => (leaving ? navigate('/teams') : undefined) });
  }

  return (
    <div className="flex flex-col gap-3">
      <FormError message={failure ? errorMessage(failure) : undefined} />
      <Table caption={`Members of ${teamName}`}>
        <THead>
          <tr>
            <Th>Name</Th>
            <Th>E-mail</Th>
            <Th>Role</Th>
            <Th>Joined</Th>
            <Th className="text-right">
              <span className="sr-only">Actions</span>
            </Th>
          </tr>
        </THead>
        <TBody>
          {members.map((member) => {
            const isMe = member.userId === myUserId;
            return (
              <Tr key={member.userId}>
                <Td className="font-semibold">
                  {member.name}
                  {isMe && <span className="ml-2 text-sm font-normal text-ink-muted">(you)</span>}
                </Td>
                <Td className="font-mono text-sm text-ink-soft">{member.email}</Td>
                <Td>
                  {isOwner ? (
                    <select
                      aria-label={`Role of ${member.name}`}
                      className={cx(inputClasses, 'w-28 border-rule-strong py-1 text-sm')}
                      value={member.role}
                      disabled={changeRole.isPending}
                      onChange={(event) =>
                        changeRole.mutate({ userId: member.userId, role: event.target.value as Role })
                      }
                    >
                      {ROLES.map((role) => (
                        <option key={role} value={role}>
                          {role}
                        </option>
                      ))}
                    </select>
                  ) : (
                    <Badge tone={member.role === 'owner' ? 'accent' : 'neutral'}>{member.role}</Badge>
                  )}
                </Td>
                <Td className="whitespace-nowrap text-ink-muted">{formatDate(member.joinedAt)}</Td>
                <Td className="text-right">
                  {(isOwner || isMe) && (
                    <Button
                      variant={isMe ? 'quiet' : 'danger'}
                      size="sm"
                      busy={remove.isPending && remove.variables === member.userId}
                      onClick={() => onRemove(member)}
                      aria-label={isMe ? `Leave ${teamName}` : `Remove ${member.name}`}
                    >
                      {isMe ? 'Leave team' : 'Remove'}
                    </Button>
                  )}
                </Td>
              </Tr>
            );
          })}
        </TBody>
      </Table>
    </div>
  );
}
