import { Navigate, useParams } from 'react-router';
import { ButtonLink } from '@/components/ui/button';
import { PageHeader } from '@/components/ui/page-header';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { useMe } from '@/features/auth/api/get-me';
import { RobotEditor } from '@/features/robot-editor/components/shell/robot-editor';
import { isSectionId } from '@/lib/editor-sections';
import { getRevision } from '@/features/robots/api/get-revision';
import { robotKeys } from '@/lib/robot-keys';
import { useRobot } from '@/features/robots/api/get-robot';
import { useSaveRevision } from '@/features/robots/api/save-revision';
import { errorMessage, isApiError } from '@/lib/api-client';
import { EDITOR_SECTIONS } from '../editor-sections';

/** /teams/:teamId/robots/:robotId/:section — the robot editor, composed from the robots API and the editor. */
export function RobotEditorRoute() {
  const { teamId = '', robotId = '', section } = useParams();
  const robot = useRobot(robotId);
  const me = useMe();
  const save = useSaveRevision(robotId);
  const basePath = `/teams/${teamId}/robots/${robotId}`;

  const known = section === 'problems' || (isSectionId(section) && EDITOR_SECTIONS[section]);
  if (!known) return <Navigate to={`${basePath}/chassis`} replace />;
  if (robot.isPending || !me.data) return <LoadingState label="Loading the robot…" />;
  if (robot.isError) {
    if (isApiError(robot.error, 404)) {
      return (
        <div className="flex flex-col items-start gap-4">
          <PageHeader
            title="Robot not found"
            description="It does not exist, was moved to the bin, or belongs to a team you are not in."
          />
          <ButtonLink to={`/teams/${teamId}`} variant="secondary">
            Back to the team
          </ButtonLink>
        </div>
      );
    }
    return <ErrorState message={errorMessage(robot.error)} onRetry={() => robot.refetch()} />;
  }
  return (
    <RobotEditor
      key={robotId}
      detail={robot.data}
      userId={me.data.id}
      section={section as Parameters<typeof RobotEditor>[0]['section']}
      sections={EDITOR_SECTIONS}
      basePath={basePath}
      save={save.mutateAsync}
      revisionQuery={(n) => ({
        queryKey: robotKeys.revision(robotId, n),
        queryFn: () => getRevision(robotId, n),
        staleTime: Infinity,
      })}
      onStale={() => void robot.refetch()}
    />
  );
}
