import { Link } from 'react-router';
import { ForgotPasswordForm } from '@/features/auth/components/forgot-password-form';
import { AuthHeading } from './auth-layout';

export function ForgotPasswordRoute() {
  return (
    <>
      <AuthHeading title="Reset your password" description="Enter the e-mail address you signed up with." />
      <ForgotPasswordForm />
      <p className="mt-6 border-t border-rule pt-4 text-sm text-ink-muted">
        Remembered it?{' '}
        <Link to="/sign-in" className="font-semibold text-accent hover:underline">
          Back to sign in
        </Link>
      </p>
    </>
  );
}
