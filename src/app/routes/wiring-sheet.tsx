import { useParams, useSearchParams } from 'react-router';
import { WiringSheetPage } from '@/features/wiring/components/wiring-sheet-page';

/** /teams/:teamId/robots/:robotId/wiring-sheet?revision=N — the printable wiring sheet. */
export function WiringSheetRoute() {
  const { teamId = '', robotId = '' } = useParams();
  const [search] = useSearchParams();
  const raw = search.get('revision');
  const parsed = raw === null ? null : Number(raw);
  const valid = parsed === null || (Number.isInteger(parsed) && parsed >= 1);
  return (
    <WiringSheetPage
      robotId={robotId}
      revision={valid ? parsed : null}
      badRevision={valid ? undefined : (raw ?? undefined)}
      backTo={`/teams/${encodeURIComponent(teamId)}/robots/${encodeURIComponent(robotId)}`}
    />
  );
}
