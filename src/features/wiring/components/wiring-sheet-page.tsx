import { useEffect } from 'react';
import { Button, ButtonLink } from '@/components/ui/button';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { errorMessage, isApiError } from '@/lib/api-client';
import { useSheetRevision } from '../api/get-sheet-revision';
import { useSheetRobot } from '../api/get-sheet-robot';
import { WiringSheet } from './wiring-sheet';

export interface WiringSheetPageProps {
  robotId: string;
  /** The revision asked for in the address; null = the robot's head revision. */
  revision: number | null;
  /** The address's revision was not a revision number. */
  badRevision?: string;
  /** Where "Back" leads (the robot's editor). */
  backTo: string;
  /** The robot's photo for the sheet's photo slot; nothing is drawn without one. */
  photoUrl?: string;
}

/**
 * The wiring sheet on screen: a toolbar to print or go back (never printed) above the sheet of
 * the asked revision, with loading and error states for both requests.
 */
export function WiringSheetPage({ robotId, revision, badRevision, backTo, photoUrl }: WiringSheetPageProps) {
  const robot = useSheetRobot(robotId);
  const wantsOther = revision !== null && robot.data !== undefined && revision !== robot.data.head.number;
  const other = useSheetRevision(robotId, wantsOther ? revision : null);
  const sheetRevision = wantsOther ? other.data : robot.data?.head;
  const name = robot.data?.robot.name;

  useEffect(() => {
    if (name && sheetRevision) document.title = `${name} — wiring sheet, revision ${sheetRevision.number}`;
  }, [name, sheetRevision]);

  const body = () => {
    if (badRevision !== undefined)
      return <ErrorState message={`“${badRevision}” is not a revision number; revisions are whole numbers from 1.`} />;
    if (robot.isPending || (wantsOther && other.isPending)) return <LoadingState label="Loading the wiring sheet…" />;
    const failed = robot.isError ? robot : wantsOther && other.isError ? other : null;
    if (failed) {
      const message = isApiError(failed.error, 404)
        ? robot.isError
          ? 'This robot does not exist, or you are not on its team.'
          : `Revision ${revision} of this robot does not exist.`
        : errorMessage(failed.error);
      return (
        <ErrorState message={message} onRetry={isApiError(failed.error, 404) ? undefined : () => failed.refetch()} />
      );
    }
    if (!robot.data || !sheetRevision) return null;
    return (
      <WiringSheet
        robotName={robot.data.robot.name}
        teamName={robot.data.robot.teamName}
        revision={sheetRevision}
        photoUrl={photoUrl ?? robot.data.robot.photoUrl ?? undefined}
      />
    );
  };

  return (
    <div className="min-h-screen bg-paper-sunken print:bg-white">
      <div className="mx-auto flex max-w-[210mm] flex-wrap items-center justify-between gap-3 px-2 py-4 print:hidden">
        <ButtonLink to={backTo} variant="quiet" size="sm">
          ← Back to the robot
        </ButtonLink>
        <div className="flex items-center gap-3">
          <span className="text-sm text-ink-muted">A4 or Letter, portrait</span>
          <Button onClick={() => window.print()} disabled={!sheetRevision}>
            Print
          </Button>
        </div>
      </div>
      <main className="pb-10 print:p-0">{body()}</main>
    </div>
  );
}
