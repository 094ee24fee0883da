import { Link, useNavigate, useSearchParams } from 'react-router';
import { ErrorState } from '@/components/ui/states';
import { ResetPasswordForm } from '@/features/auth/components/reset-password-form';
import { AuthHeading } from './auth-layout';

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const token = params.get('token');
  return (
    <>
      <AuthHeading title="Choose a new password" />
      {token ? (
        <ResetPasswordForm token={token} onDone={() => navigate('/teams', { replace: true })} />
      ) : (
        <ErrorState message="This page needs the link from the reset e-mail. Open the link again, or ask for a new one." />
      )}
      <p className="mt-6 border-t border-rule pt-4 text-sm text-ink-muted">
        <Link to="/forgot-password" className="font-semibold text-accent hover:underline">
          Ask for a new link
        </Link>
      </p>
    </>
  );
}
