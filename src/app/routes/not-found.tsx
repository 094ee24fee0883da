import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';

export function NotFoundRoute() {
  return (
    <div className="flex flex-col items-start gap-4">
      <PageHeader title="Page not found" description="There is nothing at this address." />
      <ButtonLink to="/teams" variant="secondary">
        Back to your teams
      </ButtonLink>
    </div>
  );
}
