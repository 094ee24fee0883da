import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { TBody, THead, Table, Td, Th, Tr } from '@/components/ui/table';
import { errorMessage } from '@/lib/api-client';
import { formatDate } from '@/lib/format';
import { useInvitations } from '../api/get-invitations';
import { useRevokeInvitation } from '../api/revoke-invitation';

export function InvitationsList({ teamId }: { teamId: string }) {
  const invitations = useInvitations(teamId, true);
  const revoke = useRevokeInvitation(teamId);

  if (invitations.isPending) return <LoadingState label="Loading invitations…" />;
  if (invitations.isError)
    return <ErrorState message={errorMessage(invitations.error)} onRetry={() => invitations.refetch()} />;
  if (invitations.data.invitations.length === 0) return <p className="text-sm text-ink-muted">No open invitations.</p>;

  return (
    <div className="flex flex-col gap-3">
      <FormError message={revoke.isError ? errorMessage(revoke.error) : undefined} />
      <Table caption="Open invitations">
        <THead>
          <tr>
            <Th>E-mail</Th>
            <Th>Role</Th>
            <Th>Invited by</Th>
            <Th>Expires</Th>
            <Th className="text-right">
              <span className="sr-only">Actions</span>
            </Th>
          </tr>
        </THead>
        <TBody>
          {invitations.data.invitations.map((invitation) => (
            <Tr key={invitation.id}>
              <Td className="font-mono text-sm">{invitation.email}</Td>
              <Td>
                <Badge>{invitation.role}</Badge>
              </Td>
              <Td>{invitation.invitedByName}</Td>
              <Td className="text-ink-muted">{formatDate(invitation.expiresAt)}</Td>
              <Td className="text-right">
                <Button
                  variant="quiet"
                  size="sm"
                  busy={revoke.isPending && revoke.variables === invitation.id}
                  onClick={() => revoke.mutate(invitation.id)}
                  aria-label={`Withdraw the invitation to ${invitation.email}`}
                >
                  Withdraw
                </Button>
              </Td>
            </Tr>
          ))}
        </TBody>
      </Table>
    </div>
  );
}
