import { useMemo, useState } from 'react';
import type { FirmwareFiles } from '@shared/schemas/firmware';
import { Panel } from '@/components/ui/panel';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { errorMessage } from '@/lib/api-client';
import type { SectionProps } from '@/lib/editor-sections';
import { bundleUrl } from '../api/get-bundle';
import { useRevisionFiles } from '../api/get-revision-files';
import { useDraftFiles } from '../api/preview-draft-files';
import { useDebouncedValue } from '../hooks/use-debounced-value';
import { blockersOf } from '../lib/blockers';
import { groupFiles, pickFile } from '../lib/file-groups';
import { BlockerList } from './blocker-list';
import { CodeView } from './code-view';
import { CompileCheck } from './compile-check';
import { FileTree } from './file-tree';
import { FirmwareSettings } from './firmware-settings';
import { FirmwareStatus } from './firmware-status';

function BundleFiles({ bundle, updating }: { bundle: FirmwareFiles; updating: boolean }) {
  const [wanted, setWanted] = useState<string | null>(null);
  const groups = useMemo(() => groupFiles(bundle), [bundle]);
  const file = pickFile(bundle, wanted);
  return (
    <Panel
      title="Files"
      titleId="fw-files-title"
      description={`${bundle.files.length} files${updating ? ' · updating for your latest change…' : ''}`}
    >
      <div className="grid items-start gap-4 md:grid-cols-[15rem_minmax(0,1fr)]">
        <FileTree groups={groups} selected={file?.path ?? null} onSelect={setWanted} />
        {file && <CodeView file={file} />}
      </div>
    </Panel>
  );
}

/**
 * The Firmware section: the generated bundle's files with a highlighted preview (the draft's
 * when there are unsaved changes), the download and compile check of the saved revision, the
 * boot line, the sketch and serial settings, and what stops generation, linked to its fields.
 */
export function FirmwareSection({ robot, head, config, validConfig, fieldErrors, onChange, canEdit }: SectionProps) {
  const unsaved = useMemo(() => JSON.stringify(config) !== JSON.stringify(head.config), [config, head.config]);
  // The newest draft the schema accepts; while a field is being corrected the preview stays on it.
  const settledDraft = useDebouncedValue(validConfig ?? config, 400);
  const invalidFields = Object.entries(fieldErrors ?? {}).map(([key, message]) => ({ path: key.split('.'), message }));
  const headFiles = useRevisionFiles(robot.id, head.number);
  const draftFiles = useDraftFiles(robot.id, settledDraft, unsaved);
  const shown = unsaved ? draftFiles : headFiles;
  const shownBlockers = blockersOf(shown.error);

  const headBlocked = blockersOf(headFiles.error) !== null;
  const headUnavailable = headBlocked || headFiles.isError;
  const blockedReason = !headUnavailable
    ? null
    : headBlocked
      ? unsaved
        ? `Revision ${head.number} as saved cannot become firmware; save your fixes first.`
        : `Revision ${head.number} cannot become firmware; fix what is listed below and save.`
      : `Revision ${head.number} could not be rendered: ${errorMessage(headFiles.error)}`;

  return (
    <div className="space-y-4">
      <FirmwareStatus
        showingDraft={unsaved}
        headRevision={head.number}
        downloadHref={headUnavailable ? null : bundleUrl(robot.id, head.number)}
        blockedReason={blockedReason}
        bootLine={shown.data?.bootLine ?? null}
      />
      {unsaved && invalidFields.length > 0 && (
        <BlockerList
          title="Correct these fields; until then the files follow your last valid change"
          blockers={invalidFields}
        />
      )}
      {shown.isPending && <LoadingState label="Rendering the firmware…" />}
      {shown.isError && shownBlockers && (
        <BlockerList
          title={unsaved ? 'Your changes cannot become firmware yet' : `Revision ${head.number} cannot become firmware`}
          blockers={shownBlockers}
        />
      )}
      {shown.isError && !shownBlockers && (
        <ErrorState message={errorMessage(shown.error)} onRetry={() => shown.refetch()} />
      )}
      {shown.data && !shown.isError && (
        <BundleFiles bundle={shown.data} updating={shown.isPlaceholderData && shown.isFetching} />
      )}
      <div className="grid items-start gap-4 lg:grid-cols-2">
        <CompileCheck
          robotId={robot.id}
          revision={head.number}
          blocked={headUnavailable}
          remoteFolder={headFiles.data?.remoteFolder ?? null}
        />
        <FirmwareSettings
          config={config}
          onChange={onChange}
          canEdit={canEdit}
          derivedName={config.firmware.sketchName === null ? (shown.data?.sketchFolder ?? null) : null}
        />
      </div>
    </div>
  );
}
