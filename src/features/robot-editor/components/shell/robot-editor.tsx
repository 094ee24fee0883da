import { Suspense, useCallback, useDeferredValue, useMemo, useRef, useState } from 'react';
import { useSearchParams } from 'react-router';
import { FormNotice } from '@/components/ui/form-error';
import { LoadingState } from '@/components/ui/states';
import { errorMessage, isApiError } from '@/lib/api-client';
import type { Problem } from '@shared/problems/problem';
import { robotProblems } from '@shared/problems/robot-problems';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RevisionDetail, RevisionSummary, RobotDetail, SaveRevisionInput } from '@shared/schemas/robots';
import { useDraftValidation } from '../../hooks/use-draft-validation';
import { useFieldFocus } from '../../hooks/use-field-focus';
import { useRobotDraft } from '../../hooks/use-robot-draft';
import {
  countBySection,
  fieldErrorProblems,
  problemsOfSection,
  type EditorProblem,
  type SectionCount,
} from '../../lib/section-problems';
import { SECTION_IDS, SECTION_LABELS, type SectionId, type SectionRegistry } from '@/lib/editor-sections';
import type { SectionProps } from '@/lib/editor-sections';
import { AllProblems } from './all-problems';
import { ConflictDialog, type RevisionQuery } from './conflict-dialog';
import { DiscardDialog } from './discard-dialog';
import { EditorHeader } from './editor-header';
import { LeaveGuard } from './leave-guard';
import { SaveDialog } from './save-dialog';
import { SectionNav } from './section-nav';
import { SectionProblems } from './section-problems';

export interface RobotEditorProps {
  detail: RobotDetail;
  /** The signed-in person: drafts are kept per person, so a shared computer does not mix them. */
  userId: string;
  /** The section shown, or the list of every problem. */
  section: SectionId | 'problems';
  sections: SectionRegistry;
  /** Path of the editor without the section, e.g. `/teams/t/robots/r`. */
  basePath: string;
  save: (input: SaveRevisionInput) => Promise<RevisionDetail>;
  revisionQuery: RevisionQuery;
  /** Called when the server says a newer revision exists, so the robot can be read again. */
  onStale: () => void;
}

interface SaveState {
  open: boolean;
  message: string;
  saving: boolean;
  error: string | null;
}

const CLOSED: SaveState = { open: false, message: '', saving: false, error: null };

/**
 * The robot editor: header with save, sections with live problem counts, the draft kept per
 * robot, conflicts resolved field by field, and a question before leaving unsaved work.
 */
export function RobotEditor({
  detail,
  userId,
  section,
  sections,
  basePath,
  save,
  revisionQuery,
  onStale,
}: RobotEditorProps) {
  const { robot, head } = detail;
  const canEdit = robot.role !== 'viewer';
  const draft = useRobotDraft({ userId, robotId: robot.id, canEdit }, head);
  const { valid, validConfig, fieldErrors } = useDraftValidation(draft.config, head.config);
  const engineConfig = useDeferredValue(validConfig);
  const problems = useMemo<EditorProblem[]>(() => {
    const engine = robotProblems(engineConfig);
    return [
      ...fieldErrorProblems(fieldErrors),
      ...engine.filter((p) => p.severity === 'error'),
      ...engine.filter((p) => p.severity === 'warning'),
    ];
  }, [engineConfig, fieldErrors]);
  const counts = useMemo(() => countBySection(problems), [problems]);
  const available = useMemo(() => SECTION_IDS.filter((id) => sections[id]), [sections]);
  const total = useMemo<SectionCount>(
    () => ({
      errors: problems.filter((p) => p.severity === 'error').length,
      warnings: problems.filter((p) => p.severity === 'warning').length,
    }),
    [problems],
  );

  const [saveState, setSaveState] = useState<SaveState>(CLOSED);
  const [conflict, setConflict] = useState<RevisionSummary | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [confirmDiscard, setConfirmDiscard] = useState(false);

  const openSave = useCallback((message = '') => {
    setNotice(null);
    setSaveState({ ...CLOSED, open: true, message });
  }, []);

  const submitSave = async (message: string) => {
    if (!valid) return;
    setSaveState((s) => ({ ...s, message, saving: true, error: null }));
    try {
      const revision = await save({ baseRevision: draft.baseRevision, message, config: valid });
      draft.rebase(revision);
      setSaveState(CLOSED);
      setNotice(`Saved as r${revision.number}.`);
    } catch (error) {
      if (isApiError(error, 409) && error.code === 'revision_conflict') {
        setSaveState({ ...CLOSED, message });
        setConflict(error.details.head as RevisionSummary);
        onStale();
      } else {
        setSaveState((s) => ({ ...s, saving: false, error: errorMessage(error) }));
      }
    }
  };

  const contentRef = useRef<HTMLDivElement>(null);
  const [searchParams, setSearchParams] = useSearchParams();
  const clearField = useCallback(
    () => setSearchParams((p) => (p.delete('field'), p), { replace: true }),
    [setSearchParams],
  );
  useFieldFocus(searchParams.get('field'), contentRef, clearField);

  const Section = section === 'problems' ? null : sections[section];
  const sectionProps: SectionProps = {
    robot,
    head,
    config: draft.config,
    onChange: draft.setConfig,
    problems: problems.filter((p): p is Problem => p.code !== 'invalid-field'),
    canEdit,
    validConfig,
    fieldErrors,
    requestSave: openSave,
  };
  const sectionProblems = section === 'problems' ? [] : problemsOfSection(problems, section);

  return (
    <div>
      <EditorHeader
        robot={robot}
        head={head}
        baseRevision={draft.baseRevision}
        dirty={draft.dirty}
        canEdit={canEdit}
        saving={saveState.saving}
        onSave={() => openSave(saveState.message)}
        onDiscard={() => setConfirmDiscard(true)}
      />
      <div className="mb-3 space-y-2 empty:hidden">
        <FormNotice message={notice ?? undefined} />
        {draft.behindHead && (
          <p role="status" className="rounded-md border border-warn/30 bg-warn-soft px-3 py-2 text-sm text-warn-strong">
            Your draft started from r{draft.baseRevision}; r{head.number} was saved since. Saving will show both and let
            you choose field by field.
          </p>
        )}
        {draft.storageFailed && (
          <p
            role="alert"
            className="rounded-md border border-error/30 bg-error-soft px-3 py-2 text-sm text-error-strong"
          >
            This browser would not keep the draft (storage full or turned off): save before you leave this page.
          </p>
        )}
      </div>
      <div className="grid items-start gap-6 lg:grid-cols-[12rem_minmax(0,1fr)]">
        <div className="lg:sticky lg:top-4">
          <SectionNav sections={available} counts={counts} total={total} />
        </div>
        <div ref={contentRef} className="min-w-0">
          {section === 'problems' ? (
            <AllProblems problems={problems} available={available} />
          ) : (
            <>
              <SectionProblems problems={sectionProblems} available={available} label={SECTION_LABELS[section]} />
              {Section && (
                <Suspense fallback={<LoadingState label={`Loading ${SECTION_LABELS[section]}…`} />}>
                  <Section {...sectionProps} />
                </Suspense>
              )}
            </>
          )}
        </div>
      </div>
      <SaveDialog
        open={saveState.open}
        onClose={() => setSaveState((s) => ({ ...s, open: false }))}
        initialMessage={saveState.message}
        baseRevision={draft.baseRevision}
        baseConfig={draft.baseConfig}
        draft={draft.config}
        invalidFields={Object.keys(fieldErrors).length}
        saving={saveState.saving}
        error={saveState.error}
        onSubmit={submitSave}
      />
      <ConflictDialog
        theirs={conflict}
        baseRevision={draft.baseRevision}
        mine={draft.config}
        revisionQuery={revisionQuery}
        onClose={() => setConflict(null)}
        onRebase={(theirs: RevisionDetail, next: RobotConfig) => {
          draft.rebase(theirs, next);
          setConflict(null);
          openSave(saveState.message);
        }}
      />
      <DiscardDialog
        open={confirmDiscard}
        baseRevision={draft.baseRevision}
        onClose={() => setConfirmDiscard(false)}
        onDiscard={() => {
          draft.discard();
          setConfirmDiscard(false);
          setNotice(`Draft discarded: showing r${head.number}.`);
        }}
      />
      <LeaveGuard dirty={draft.dirty && canEdit} basePath={basePath} onDiscard={draft.discard} />
    </div>
  );
}
