import { useState } from 'react';
import { Link } from 'react-router';
import type { PinDemand } from '@shared/pins/pin-demands';
import { buttonClasses } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { AssignPinsBar } from './assign-pins-bar';
import { BoardChooser } from './board-chooser';
import { BoardPinList } from './board-pin-list';
import { DriversPanel } from './drivers-panel';
import { ExtraPinsPanel, InputPinsPanel, RemotePinsPanel } from './input-pins-panel';
import { WiringProblemList } from './wiring-problem-list';
import { HighlightProvider } from '../hooks/wiring-highlight';
import { useWiringModel } from '../hooks/use-wiring-model';
import { setRoleLock, setRolePin } from '../lib/pin-records';
import { wiringSheetPath } from '../lib/sheet-path';
import type { SectionProps } from '@/lib/editor-sections';

/**
 * The Wiring section: the board and its pins, the motor drivers with a pin for every role, the
 * input's pins, the status LED and bench-test pin, automatic assignment and the wiring sheet.
 */
export function WiringSection({ robot, head, config, onChange, problems, canEdit }: SectionProps) {
  const model = useWiringModel(config, problems);
  const [pinSide, setPinSide] = useState<'robot' | 'remote'>('robot');
  const onRolePin = (d: PinDemand, pin: string | null) => onChange(setRolePin(config, d, pin));
  const onRoleLock = (d: PinDemand, locked: boolean) => onChange(setRoleLock(config, d, locked));
  const shared = { choices: model.choices, problems: model.wiringProblems, canEdit, onRolePin, onRoleLock };
  const hasRemote = model.remoteDemands.length > 0;
  const side = hasRemote ? pinSide : 'robot';
  const unsaved = JSON.stringify(config) !== JSON.stringify(head.config);

  return (
    <HighlightProvider>
      <div className="@container space-y-4">
        <div className="flex flex-col gap-3 rounded-lg border border-rule bg-paper-raised px-4 py-3">
          <BoardChooser config={config} canEdit={canEdit} onChange={onChange} />
          <div className="flex flex-wrap items-start justify-between gap-3 border-t border-rule pt-3">
            <AssignPinsBar config={config} canEdit={canEdit} onChange={onChange} />
            <div className="flex flex-col items-end gap-1">
              <Link
                to={wiringSheetPath(robot.teamId, robot.id, head.number)}
                target="_blank"
                rel="noopener"
                className={buttonClasses('secondary')}
              >
                Print wiring sheet
              </Link>
              <span className="max-w-64 text-right text-xs text-ink-muted">
                Revision {head.number} as saved{unsaved ? '; save first to print your changes' : ''}.
              </span>
            </div>
          </div>
        </div>
        <WiringProblemList problems={model.wiringProblems} />
        <div className="grid items-start gap-4 @4xl:grid-cols-[minmax(0,1.4fr)_minmax(21rem,1fr)]">
          <div className="min-w-0 space-y-4">
            <DriversPanel
              config={config}
              demands={model.robotDemands}
              advice={model.advice}
              onChange={onChange}
              {...shared}
            />
            <InputPinsPanel config={config} demands={model.robotDemands} {...shared} />
            {hasRemote && (
              <RemotePinsPanel config={config} demands={model.remoteDemands} onChange={onChange} {...shared} />
            )}
            <ExtraPinsPanel demands={model.robotDemands} {...shared} />
          </div>
          <aside
            aria-labelledby="wiring-pins-title"
            className="rounded-lg border border-rule bg-paper-raised @4xl:sticky @4xl:top-4"
          >
            <header className="flex flex-wrap items-center justify-between gap-2 border-b border-rule px-4 py-2">
              <h2 id="wiring-pins-title" className="text-base font-semibold">
                {side === 'robot' ? model.board.name : `Remote: ${model.remoteBoard.name}`}
              </h2>
              {hasRemote && (
                <div
                  role="radiogroup"
                  aria-label="Which board"
                  className="flex rounded-md border border-rule-strong text-xs"
                >
                  {(['robot', 'remote'] as const).map((s) => (
                    <button
                      key={s}
                      type="button"
                      role="radio"
                      aria-checked={side === s}
                      onClick={() => setPinSide(s)}
                      className={cx(
                        'px-2 py-1 font-semibold first:rounded-l-md last:rounded-r-md',
                        side === s ? 'bg-ink text-paper' : 'text-ink-soft hover:bg-paper-sunken',
                      )}
                    >
                      {s === 'robot' ? 'Robot' : 'Remote'}
                    </button>
                  ))}
                </div>
              )}
            </header>
            <div className="px-4 py-2 @4xl:max-h-[calc(100vh-6rem)] @4xl:overflow-y-auto">
              <BoardPinList
                board={side === 'robot' ? model.board : model.remoteBoard}
                side={side}
                demands={side === 'robot' ? model.robotDemands : model.remoteDemands}
                problems={model.wiringProblems}
                roleLabel={model.listLabel}
              />
            </div>
          </aside>
        </div>
      </div>
    </HighlightProvider>
  );
}
