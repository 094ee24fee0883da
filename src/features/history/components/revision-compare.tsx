import { ErrorState, LoadingState } from '@/components/ui/states';
import { errorMessage } from '@/lib/api-client';
import type { RevisionDiff } from '@shared/schemas/history';
import { useRevisionDiff } from '../api/get-revision-diff';
import { FileDiffView } from './file-diff-view';
import type { ComparePair } from './revision-list';
import { SettingsDiff } from './settings-diff';

function GeneratedFiles({ files, from, to }: { files: RevisionDiff['files']; from: number; to: number }) {
  if (!files.available) return <p className="text-ink-muted">{files.reason}</p>;
  const { changed, stampOnly, unchanged } = files;
  return (
    <div className="space-y-2">
      {changed.length === 0 && (
        <p className="text-ink-muted">The generated code is the same apart from the revision stamp.</p>
      )}
      {changed.map((file) => (
        <FileDiffView key={file.path} file={file} from={from} to={to} open={changed.length <= 3} />
      ))}
      {stampOnly.length > 0 && (
        <p className="text-sm text-ink-muted">
          {stampOnly.length} {stampOnly.length === 1 ? 'file differs' : 'files differ'} only in the revision stamp:{' '}
          <span className="font-mono">{stampOnly.join(', ')}</span>
        </p>
      )}
      {unchanged.length > 0 && (
        <p className="text-sm text-ink-muted">
          {unchanged.length} {unchanged.length === 1 ? 'file is' : 'files are'} identical.
        </p>
      )}
    </div>
  );
}

/** What changed between two revisions: the settings in words, then the generated files side by side. */
export function RevisionCompare({ robotId, pair }: { robotId: string; pair: ComparePair | null }) {
  const diff = useRevisionDiff(robotId, pair);
  if (!pair) return <p className="text-ink-muted">Choose a “from” and a “to” revision in the list to compare them.</p>;
  if (diff.isPending) return <LoadingState label={`Comparing r${pair.from} with r${pair.to}…`} />;
  if (diff.isError) return <ErrorState message={errorMessage(diff.error)} onRetry={() => diff.refetch()} />;
  const { from, to, settings, files } = diff.data;
  return (
    <div className="space-y-6">
      <section aria-labelledby={`settings-${robotId}`}>
        <h3 id={`settings-${robotId}`} className="mb-2 font-semibold">
          Settings: r{from.number} “{from.message}” → r{to.number} “{to.message}”
        </h3>
        <SettingsDiff changes={settings} from={from.number} to={to.number} />
      </section>
      <section aria-labelledby={`files-${robotId}`}>
        <h3 id={`files-${robotId}`} className="mb-2 font-semibold">
          Generated files
        </h3>
        <GeneratedFiles files={files} from={from.number} to={to.number} />
      </section>
    </div>
  );
}
