import { Link, Outlet } from 'react-router';
import { Wordmark } from '@/components/ui/wordmark';

/** Sign-in and other account pages: one card on the drafting table. */
export function AuthLayout() {
  return (
    <div className="drafting-grid flex min-h-screen flex-col items-center px-4 py-10 sm:py-16">
      <Link to="/" className="mb-8 rounded-md" aria-label="Mixwright home">
        <Wordmark />
      </Link>
      <main className="w-full max-w-md rounded-lg border border-rule bg-paper-raised px-6 py-7 shadow-[0_1px_3px_rgba(29,42,68,0.08)] sm:px-8">
        <Outlet />
      </main>
      <p className="mt-6 max-w-md text-center text-sm text-ink-muted">
        Mixwright turns a small radio-controlled robot&apos;s drive base into firmware you can read, test and keep in
        step with the robot.
      </p>
    </div>
  );
}

export function AuthHeading({ title, description }: { title: string; description?: string }) {
  return (
    <div className="mb-5">
      <h1 className="text-2xl font-bold text-ink">{title}</h1>
      {description && <p className="mt-1 text-ink-muted">{description}</p>}
    </div>
  );
}
