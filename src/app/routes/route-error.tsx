import { isRouteErrorResponse, useRouteError } from 'react-router';
import { ButtonLink } from '@/components/ui/button';
import { Wordmark } from '@/components/ui/wordmark';
import { errorMessage } from '@/lib/api-client';

/** Shown when a page fails to load or render. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : errorMessage(error);
  return (
    <div className="drafting-grid flex min-h-screen flex-col items-center px-4 py-16">
      <Wordmark className="mb-8" />
      <main role="alert" className="w-full max-w-md rounded-lg border border-error/30 bg-paper-raised px-6 py-6">
        <h1 className="text-xl font-bold text-error-strong">This page could not be shown</h1>
        <p className="mt-2 text-ink-soft">{message}</p>
        <ButtonLink to="/" variant="secondary" className="mt-5">
          Start again
        </ButtonLink>
      </main>
    </div>
  );
}
