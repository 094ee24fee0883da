import { getBoard } from '@shared/boards/boards';
import type { SketchCheck } from '@shared/schemas/firmware';
import { Badge } from '@/components/ui/badge';
import { Button } from '@/components/ui/button';
import { Panel } from '@/components/ui/panel';
import { ErrorState } from '@/components/ui/states';
import { errorMessage } from '@/lib/api-client';
import { useVerifyRevision } from '../api/verify-revision';
import { UsageBar } from './usage-bar';

function Outcome({ sketch }: { sketch: SketchCheck }) {
  if (sketch.ok === true) return <Badge tone="accent">Compiles</Badge>;
  if (sketch.ok === null) return <Badge tone="neutral">Not checked here</Badge>;
  return (
    <span className="inline-flex items-center rounded border border-error/30 bg-error-soft px-1.5 py-0.5 text-xs font-semibold text-error-strong">
      {sketch.timedOut ? 'Stopped at the time limit' : 'Does not compile'}
    </span>
  );
}

function SketchResult({ sketch, remote }: { sketch: SketchCheck; remote: boolean }) {
  return (
    <li className="space-y-2 py-2.5 first:pt-0 last:pb-0">
      <div className="flex flex-wrap items-center gap-x-2 gap-y-1">
        <span className="font-mono text-sm font-semibold">{sketch.folder}</span>
        <span className="text-sm text-ink-muted">
          {remote ? 'remote transmitter' : 'robot'} · {getBoard(sketch.board).name}
        </span>
        <Outcome sketch={sketch} />
      </div>
      {sketch.ok === true && sketch.flashMax !== undefined && sketch.ramMax !== undefined && (
        <div className="space-y-1.5">
          <UsageBar label="Flash" bytes={sketch.flashBytes ?? 0} max={sketch.flashMax} kind="flash" />
          <UsageBar label="RAM" bytes={sketch.ramBytes ?? 0} max={sketch.ramMax} kind="ram" />
        </div>
      )}
      {sketch.ok === null && <p className="text-sm text-ink-muted">{sketch.messages}</p>}
      {sketch.ok === false && (
        <pre className="max-h-56 overflow-auto rounded border border-error/30 bg-error-soft/50 px-3 py-2 font-mono text-xs whitespace-pre-wrap text-error-strong">
          {sketch.messages}
        </pre>
      )}
    </li>
  );
}

export interface CompileCheckProps {
  robotId: string;
  revision: number;
  /** The revision cannot be generated (or rendered), so there is nothing to compile. */
  blocked: boolean;
  remoteFolder: string | null;
}

/** Compiles the saved revision on the server and shows flash and RAM use, or the compiler's messages. */
export function CompileCheck({ robotId, revision, blocked, remoteFolder }: CompileCheckProps) {
  const verify = useVerifyRevision(robotId, revision);
  const result = verify.data;
  return (
    <Panel
      title="Compile check"
      titleId="fw-compile-title"
      description={`Revision ${revision} as saved, built for its board on the server.`}
      actions={
        <Button
          variant="secondary"
          size="sm"
          onClick={() => verify.check()}
          busy={verify.isFetching}
          disabled={blocked}
        >
          {result ? 'Check again' : 'Check that it compiles'}
        </Button>
      }
    >
      <div aria-live="polite" className="space-y-2">
        {blocked && (
          <p className="text-sm text-ink-muted">
            Revision {revision} cannot become firmware, so there is nothing to compile yet.
          </p>
        )}
        {!blocked && verify.isFetching && (
          <p className="text-sm text-ink-muted">
            Compiling… the server builds one bundle at a time; this takes a few seconds.
          </p>
        )}
        {!blocked && !verify.isFetching && verify.isError && (
          <ErrorState message={errorMessage(verify.error)} onRetry={() => verify.check()} />
        )}
        {!blocked && !verify.isFetching && !result && !verify.isError && (
          <p className="text-sm text-ink-muted">
            AVR boards (Uno, Nano, Mega 2560) are compiled with avr-gcc against the Arduino AVR core, with warnings
            treated as errors. ESP32 and RP2040 sketches are not compiled on this server.
          </p>
        )}
        {result && !verify.isFetching && (
          <ul className="divide-y divide-rule">
            {result.sketches.map((sketch) => (
              <SketchResult key={sketch.folder} sketch={sketch} remote={sketch.folder === remoteFolder} />
            ))}
          </ul>
        )}
      </div>
    </Panel>
  );
}
