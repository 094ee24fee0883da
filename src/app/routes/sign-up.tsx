import { Link, useNavigate, useSearchParams } from 'react-router';
import { SignUpForm } from '@/features/auth/components/sign-up-form';
import { safeNext } from '../guards';
import { AuthHeading } from './auth-layout';

export function SignUpRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNext(params.get('next'));
  const signInLink = `/sign-in${params.size ? `?${params.toString()}` : ''}`;
  return (
    <>
      <AuthHeading
        title="Create an account"
        description="Keep your robots' configurations, revisions and firmware in one place."
      />
      <SignUpForm defaultEmail={params.get('email') ?? ''} onSignedUp={() => navigate(next, { replace: true })} />
      <p className="mt-6 border-t border-rule pt-4 text-sm text-ink-muted">
        Already have an account?{' '}
        <Link to={signInLink} className="font-semibold text-accent hover:underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
