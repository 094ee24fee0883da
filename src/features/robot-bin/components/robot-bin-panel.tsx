import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Panel } from '@/components/ui/panel';
import { ErrorState } from '@/components/ui/states';
import { errorMessage } from '@/lib/api-client';
import { formatDate } from '@/lib/format';
import { useRobotBin } from '../api/get-robot-bin';
import { useRestoreBinnedRobot } from '../api/restore-binned-robot';

/** Owners' list of deleted robots that can still come back (30 days after deletion). */
export function DeletedRobotsPanel({ teamId }: { teamId: string }) {
  const bin = useRobotBin(teamId);
  const restore = useRestoreBinnedRobot(teamId);
  if (bin.isPending || (bin.data && bin.data.length === 0)) return null;
  return (
    <Panel
      title="Deleted robots"
      titleId="robot-bin-title"
      description="Restorable for 30 days after deletion, with all their revisions; after that they are removed for good."
    >
      {bin.isError && <ErrorState message={errorMessage(bin.error)} onRetry={() => bin.refetch()} />}
      {bin.data && (
        <ul className="divide-y divide-rule">
          {bin.data.map((robot) => (
            <li key={robot.id} className="flex flex-wrap items-center justify-between gap-3 py-2">
              <span>
                <span className="font-semibold">{robot.name}</span>{' '}
                <span className="text-sm text-ink-muted">
                  r{robot.headRevision} · deleted {formatDate(robot.deletedAt)} by {robot.deletedByName ?? 'someone'} ·
                  restorable until {formatDate(robot.restorableUntil)}
                </span>
              </span>
              <Button
                size="sm"
                variant="secondary"
                busy={restore.isPending && restore.variables === robot.id}
                onClick={() => restore.mutate(robot.id)}
              >
                Restore {robot.name}
              </Button>
            </li>
          ))}
        </ul>
      )}
      <FormError className="mt-2" message={restore.isError ? errorMessage(restore.error) : undefined} />
    </Panel>
  );
}
