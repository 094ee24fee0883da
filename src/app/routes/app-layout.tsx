import { Link, NavLink, Outlet, useMatches } from 'react-router';
import { cx } from '@/components/ui/cx';
import { Wordmark } from '@/components/ui/wordmark';
import { useMe } from '@/features/auth/api/get-me';
import { SignOutButton } from '../sign-out-button';

/** Signed-in pages: a quiet top bar and the page below. */
export function AppLayout() {
  const me = useMe();
  // Working screens (the robot editor) use the whole width; reading pages keep a measure.
  const wide = useMatches().some((m) => (m.handle as { wide?: boolean } | undefined)?.wide);
  const width = wide ? 'max-w-[100rem]' : 'max-w-6xl';

  return (
    <div className="flex min-h-screen flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-10 focus:rounded focus:bg-paper-raised focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <header className="border-b border-rule bg-paper-raised">
        <div className={cx('mx-auto flex h-14 items-center gap-6 px-4 sm:px-6', width)}>
          <Link to="/teams" className="rounded-md" aria-label="Mixwright, your teams">
            <Wordmark className="[&_span]:text-lg" />
          </Link>
          <nav aria-label="Main" className="flex items-center gap-1">
            <NavLink
              to="/teams"
              end
              className={({ isActive }) =>
                cx(
                  'rounded-md px-3 py-1.5 text-[0.95rem] font-semibold',
                  isActive ? 'bg-accent-soft text-accent-strong' : 'text-ink-soft hover:bg-paper-sunken',
                )
              }
            >
              Teams
            </NavLink>
          </nav>
          <div className="ml-auto flex items-center gap-3">
            {me.data && (
              <span className="hidden text-sm text-ink-muted sm:inline" title={me.data.email}>
                {me.data.name}
              </span>
            )}
            <SignOutButton variant="secondary" size="sm" />
          </div>
        </div>
      </header>
      <main id="main" className={cx('mx-auto w-full flex-1 px-4 sm:px-6', width, wide ? 'py-5' : 'py-8')}>
        <Outlet />
      </main>
    </div>
  );
}
