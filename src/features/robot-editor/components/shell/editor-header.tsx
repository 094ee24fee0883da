import { Link } from 'react-router';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { formatDateTime } from '@/lib/format';
import type { RobotDetail } from '@shared/schemas/robots';

export interface EditorHeaderProps {
  robot: RobotDetail['robot'];
  head: RobotDetail['head'];
  baseRevision: number;
  dirty: boolean;
  canEdit: boolean;
  saving: boolean;
  onSave: () => void;
  onDiscard: () => void;
}

/** Robot name, where the draft stands, and the one action that matters: save. */
export function EditorHeader({
  robot,
  head,
  baseRevision,
  dirty,
  canEdit,
  saving,
  onSave,
  onDiscard,
}: EditorHeaderProps) {
  return (
    <header className="mb-4 flex flex-wrap items-end justify-between gap-4 border-b border-rule pb-3">
      <div className="min-w-0">
        <nav aria-label="Breadcrumb" className="text-sm text-ink-muted">
          <Link to={`/teams/${robot.teamId}`} className="font-semibold hover:text-ink hover:underline">
            {robot.teamName}
          </Link>
          <span aria-hidden="true"> / </span>
          <span>Robots</span>
        </nav>
        <h1 className="truncate text-[1.6rem] leading-tight font-bold text-ink">{robot.name}</h1>
        <p className="mt-0.5 flex flex-wrap items-center gap-2 text-sm text-ink-muted">
          <span>
            Head <span className="font-mono text-ink">r{head.number}</span>
            {head.authorName && <> by {head.authorName}</>}, {formatDateTime(head.createdAt)}: “{head.message}”
          </span>
        </p>
      </div>
      <div className="flex items-center gap-2">
        {!canEdit && <Badge>Read only: you are a viewer</Badge>}
        {canEdit && (
          <span role="status" className="w-52 text-right text-sm">
            {dirty ? (
              <span className="font-semibold text-warn-strong">
                <span aria-hidden="true">● </span>Unsaved changes on r{baseRevision}
              </span>
            ) : (
              <span className="text-ink-muted">No unsaved changes</span>
            )}
          </span>
        )}
        {canEdit && (
          <>
            <Button variant="quiet" onClick={onDiscard} disabled={!dirty || saving}>
              Discard draft
            </Button>
            <Button onClick={onSave} disabled={!dirty} busy={saving}>
              Save…
            </Button>
          </>
        )}
      </div>
    </header>
  );
}
