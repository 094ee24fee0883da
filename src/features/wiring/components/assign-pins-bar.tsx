import { useState } from 'react';
import { assignPins } from '@shared/pins/assign-pins';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { Button } from '@/components/ui/button';
import { describePinChange, pinChanges, type PinChange } from '../lib/pin-changes';

type Outcome =
  | { kind: 'done'; before: RobotConfig; after: RobotConfig; changes: PinChange[] }
  | { kind: 'failed'; reason: string }
  | { kind: 'undone'; count: number };

const sameConfig = (a: RobotConfig, b: RobotConfig) => a === b || JSON.stringify(a) === JSON.stringify(b);

/**
 * "Assign free pins": fills every unlocked role with the pin plan's search, keeping locked pins,
 * then lists what moved. Undo puts the pins back while nothing else has been edited since.
 */
export function AssignPinsBar({
  config,
  canEdit,
  onChange,
}: {
  config: RobotConfig;
  canEdit: boolean;
  onChange: (next: RobotConfig) => void;
}) {
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const run = () => {
    const result = assignPins(config);
    if (!result.ok) return setOutcome({ kind: 'failed', reason: result.reason });
    setOutcome({ kind: 'done', before: config, after: result.config, changes: pinChanges(config, result.config) });
    onChange(result.config);
  };
  const canUndo = outcome?.kind === 'done' && outcome.changes.length > 0 && sameConfig(config, outcome.after);
  const undo = () => {
    if (outcome?.kind !== 'done') return;
    onChange(outcome.before);
    setOutcome({ kind: 'undone', count: outcome.changes.length });
  };
  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-2">
        <Button onClick={run} disabled={!canEdit}>
          Assign free pins
        </Button>
        {canUndo && (
          <Button variant="secondary" onClick={undo}>
            Undo assignment
          </Button>
        )}
        <span className="text-sm text-ink-muted">Locked pins stay where they are.</span>
      </div>
      <div aria-live="polite">
        {outcome?.kind === 'failed' && (
          <p
            role="alert"
            className="rounded-md border border-error/30 bg-error-soft px-3 py-2 text-sm text-error-strong"
          >
            No pins were changed. {outcome.reason}
          </p>
        )}
        {outcome?.kind === 'done' && (
          <div
            role="status"
            className="rounded-md border border-accent/30 bg-accent-soft px-3 py-2 text-sm text-accent-strong"
          >
            {outcome.changes.length === 0 ? (
              'Every role already had a suitable pin; nothing changed.'
            ) : (
              <>
                <p className="font-semibold">
                  {outcome.changes.length} pin{outcome.changes.length === 1 ? '' : 's'} assigned
                  {sameConfig(config, outcome.after) ? '' : ' (edited since, so it can no longer be undone)'}:
                </p>
                <ul className="mt-1 columns-2 gap-6 font-mono text-[13px] text-ink">
                  {outcome.changes.map((c) => (
                    <li key={c.key}>{describePinChange(c).replace(/^./, (ch) => ch.toUpperCase())}</li>
                  ))}
                </ul>
              </>
            )}
          </div>
        )}
        {outcome?.kind === 'undone' && (
          <p role="status" className="rounded-md border border-rule-strong bg-paper px-3 py-2 text-sm text-ink-soft">
            Put back the {outcome.count} pin{outcome.count === 1 ? '' : 's'} as they were before the assignment.
          </p>
        )}
      </div>
    </div>
  );
}
