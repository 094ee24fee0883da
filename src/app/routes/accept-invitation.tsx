import { useNavigate, useParams } from 'react-router';
import { Badge } from '@/components/ui/badge';
import { Button, ButtonLink } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { useMe } from '@/features/auth/api/get-me';
import { useAcceptInvitation } from '@/features/teams/api/accept-invitation';
import { useInvitationPreview } from '@/features/teams/api/get-invitation-preview';
import { errorMessage } from '@/lib/api-client';
import { formatDate } from '@/lib/format';
import { ROLE_SUMMARIES } from '@shared/schemas/teams';
import { SignOutButton } from '../sign-out-button';
import { AuthHeading } from './auth-layout';

export function AcceptInvitationRoute() {
  const { token = '' } = useParams();
  const navigate = useNavigate();
  const preview = useInvitationPreview(token);
  const me = useMe();
  const accept = useAcceptInvitation();

  if (preview.isPending || me.isPending) return <LoadingState label="Opening the invitation…" />;
  if (preview.isError) {
    return (
      <>
        <AuthHeading title="Invitation" />
        <ErrorState message={errorMessage(preview.error)} />
        <ButtonLink to="/" variant="secondary" className="mt-5">
          Go to Mixwright
        </ButtonLink>
      </>
    );
  }
  const invitation = preview.data;
  const user = me.data ?? null;
  const here = `/invitations/${token}`;
  const query = new URLSearchParams({ email: invitation.email, next: here }).toString();
  const sameEmail = user && user.email === invitation.email;

  return (
    <>
      <AuthHeading title={`Join ${invitation.teamName}`} />
      <div className="mb-5 rounded-md border border-rule bg-paper px-4 py-3">
        <p>
          <span className="font-semibold">{invitation.invitedByName}</span> invited{' '}
          <span className="font-mono text-sm">{invitation.email}</span> to join as{' '}
          <Badge tone="accent">{invitation.role}</Badge>
        </p>
        <p className="mt-1 text-sm text-ink-muted">
          {ROLE_SUMMARIES[invitation.role]}. The link works until {formatDate(invitation.expiresAt)}.
        </p>
      </div>
      <FormError message={accept.isError ? errorMessage(accept.error) : undefined} className="mb-4" />
      {!user && (
        <div className="flex flex-col gap-3">
          <ButtonLink to={`/sign-up?${query}`}>Create an account to accept</ButtonLink>
          <ButtonLink to={`/sign-in?${query}`} variant="secondary">
            I already have an account
          </ButtonLink>
        </div>
      )}
      {user && sameEmail && (
        <Button
          className="w-full"
          busy={accept.isPending}
          onClick={() =>
            accept.mutate(token, { onSuccess: ({ teamId }) => navigate(`/teams/${teamId}`, { replace: true }) })
          }
        >
          Accept and open the team
        </Button>
      )}
      {user && !sameEmail && (
        <div className="flex flex-col gap-3">
          <p className="text-sm text-ink-soft">
            You are signed in as <span className="font-mono">{user.email}</span>. This invitation is for another
            address; sign in with that one to accept it.
          </p>
          <SignOutButton variant="secondary" to={`/sign-in?${query}`}>
            Sign out and switch account
          </SignOutButton>
        </div>
      )}
    </>
  );
}
