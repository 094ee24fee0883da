import { Link, useNavigate, useSearchParams } from 'react-router';
import { SignInForm } from '@/features/auth/components/sign-in-form';
import { safeNext } from '../guards';
import { AuthHeading } from './auth-layout';

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const next = safeNext(params.get('next'));
  const signUpLink = `/sign-up${params.size ? `?${params.toString()}` : ''}`;
  return (
    <>
      <AuthHeading title="Sign in" description="Welcome back to the workshop." />
      <SignInForm defaultEmail={params.get('email') ?? ''} onSignedIn={() => navigate(next, { replace: true })} />
      <p className="mt-6 border-t border-rule pt-4 text-sm text-ink-muted">
        New here?{' '}
        <Link to={signUpLink} className="font-semibold text-accent hover:underline">
          Create an account
        </Link>
      </p>
    </>
  );
}
