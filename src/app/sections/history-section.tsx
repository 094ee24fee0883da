import { useState } from 'react';
import { useNavigate } from 'react-router';
import { Panel } from '@/components/ui/panel';
import { ErrorState, LoadingState } from '@/components/ui/states';
import type { SectionProps } from '@/lib/editor-sections';
import { errorMessage } from '@/lib/api-client';
import { useRobotHistory } from '@/features/history/api/get-robot-history';
import { BootLineBox } from '@/features/boot-line/components/boot-line-box';
import { DeleteRobotButton } from '@/features/robot-bin/components/delete-robot-button';
import { ExportImportPanel } from '@/features/robot-files/components/export-import-panel';
import { FlashLogPanel } from '@/features/flash-log/components/flash-log-panel';
import { RevisionCompare } from '@/features/history/components/revision-compare';
import { RevisionList, type ComparePair } from '@/features/history/components/revision-list';
import { RobotPhotoControl } from '@/features/photos/components/robot-photo';

/** Until the person picks, compare the head with the revision before it. */
function defaultPair(head: number): ComparePair | null {
  return head >= 2 ? { from: head - 1, to: head } : null;
}

/**
 * The robot's history and sharing: every revision with its problems and flashes, a comparison
 * of any two, restore, the flash log, the boot-line check, export and import, the photo, and
 * (for owners) the bin.
 */
export function HistorySection({ robot, canEdit }: SectionProps) {
  const history = useRobotHistory(robot.id);
  const [picked, setPicked] = useState<ComparePair | null>(null);
  const navigate = useNavigate();
  if (history.isPending) return <LoadingState label="Loading the history…" />;
  if (history.isError) return <ErrorState message={errorMessage(history.error)} onRetry={() => history.refetch()} />;
  const { revisions, headRevision, lastFlash } = history.data;
  const pair = picked ?? defaultPair(headRevision);
  const numbers = revisions.map((r) => r.number);
  return (
    <div className="grid gap-6">
      <Panel
        title="Revisions"
        titleId={`revisions-${robot.id}`}
        description="Every saved revision, newest first. Choose a “from” and a “to” to compare."
      >
        <RevisionList
          robotId={robot.id}
          revisions={revisions}
          headRevision={headRevision}
          onRobot={lastFlash?.revisionNumber ?? null}
          pair={pair}
          onPairChange={setPicked}
          canEdit={canEdit}
        />
      </Panel>
      <Panel title="What changed" titleId={`compare-${robot.id}`}>
        <RevisionCompare robotId={robot.id} pair={pair} />
      </Panel>
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Panel
          title="Flash log"
          titleId={`flashes-${robot.id}`}
          description="Which revision went onto the robot, when, and by whom."
        >
          <FlashLogPanel robotId={robot.id} revisions={numbers} headRevision={headRevision} canEdit={canEdit} />
        </Panel>
        <Panel
          title="What is on the robot?"
          titleId={`boot-${robot.id}`}
          description="The firmware prints its revision and configuration hash when it starts."
        >
          <BootLineBox robotId={robot.id} />
        </Panel>
      </div>
      <div className="grid items-start gap-6 lg:grid-cols-2">
        <Panel
          title="Export and import"
          titleId={`files-${robot.id}`}
          description="A revision’s configuration as a JSON file; a firmware bundle carries the same file."
        >
          <ExportImportPanel
            robotId={robot.id}
            robotName={robot.name}
            revisions={numbers}
            headRevision={headRevision}
            canEdit={canEdit}
          />
        </Panel>
        <Panel
          title="Photo"
          titleId={`photo-${robot.id}`}
          description="Shown on the dashboard and the printed wiring sheet; only team members see it."
        >
          <RobotPhotoControl robotId={robot.id} name={robot.name} photoUrl={robot.photoUrl} canEdit={canEdit} />
        </Panel>
      </div>
      {robot.role === 'owner' && (
        <Panel title="Bin" titleId={`bin-${robot.id}`}>
          <DeleteRobotButton
            robotId={robot.id}
            teamId={robot.teamId}
            name={robot.name}
            onDeleted={() => navigate(`/teams/${robot.teamId}`)}
          />
        </Panel>
      )}
    </div>
  );
}
