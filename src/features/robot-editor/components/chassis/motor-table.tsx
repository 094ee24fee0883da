import { useEffect, useState } from 'react';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { Panel } from '@/components/ui/panel';
import { renameMotor, syncMotors } from '../../lib/chassis-edits';
import { NumberCell, TableErrors } from '../fields/draft-cells';
import { useDraftFields } from '../fields/draft-fields-context';
import { compactInputClasses } from '../fields/number-input';

/** The motors: names (renamed everywhere at once), start threshold, stall current and rated voltage. */
export function MotorTable() {
  const { config, update, disabled } = useDraftFields();
  const [renameError, setRenameError] = useState<string | null>(null);
  return (
    <Panel title="Motors" titleId="motor-table-title" description="The firmware's bench test runs them in this order.">
      <div className="overflow-x-auto" data-field="motors">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Motors</caption>
          <thead className="border-b border-rule-strong text-xs text-ink-muted">
            <tr>
              <th scope="col" className="py-1 pr-1.5 font-semibold tracking-wide uppercase">Motor</th>
              <th scope="col" className="px-1.5 py-1 font-semibold" title="Duty below which the motor only hums; commands jump past it">
                <span className="tracking-wide uppercase">Start threshold</span> (%)
              </th>
              <th scope="col" className="px-1.5 py-1 font-semibold" title="From the motor's datasheet, or measured with the shaft held">
                <span className="tracking-wide uppercase">Stall current</span> (A)
              </th>
              <th scope="col" className="px-1.5 py-1 font-semibold">
                <span className="tracking-wide uppercase">Rated</span> (V)
              </th>
              <th scope="col" className="px-1.5 py-1 font-semibold tracking-wide uppercase">Drives</th>
              <th scope="col" className="w-10"><span className="sr-only">Remove</span></th>
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {config.motors.map((motor, i) => {
              const wheels = config.chassis.wheels.filter((w) => w.motor === motor.name).map((w) => w.name);
              return (
                <tr key={i} className="h-10">
                  <td className="py-1 pr-1.5">
                    <MotorNameCell
                      index={i}
                      name={motor.name}
                      disabled={disabled}
                      onRename={(name) => {
                        const result = renameMotor(config, i, name);
                        setRenameError(result.ok ? null : result.reason);
                        if (result.ok) update(() => result.config);
                        return result.ok;
                      }}
                    />
                  </td>
                  <td className="px-1.5 py-1"><NumberCell path={['motors', i, 'startThreshold']} label={`${motor.name}: start threshold in percent`} scale={100} width="w-16" /></td>
                  <td className="px-1.5 py-1"><NumberCell path={['motors', i, 'stallCurrentA']} label={`${motor.name}: stall current in amperes`} width="w-16" /></td>
                  <td className="px-1.5 py-1"><NumberCell path={['motors', i, 'ratedVoltage']} label={`${motor.name}: rated voltage`} width="w-16" /></td>
                  <td className={cx('px-1.5 py-1 whitespace-nowrap', wheels.length === 0 ? 'font-semibold text-error' : 'text-ink-soft')}>{wheels.length ? wheels.join(', ') : 'no wheel'}</td>
                  <td className="py-1 pl-1.5 text-right">
                    {wheels.length === 0 && !disabled && (
                      <Button size="sm" variant="quiet" aria-label={`Remove ${motor.name}`} title={`Remove ${motor.name}`} onClick={() => update((c) => syncMotors(c))}>
                        ✕
                      </Button>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {renameError && (
        <p role="alert" className="mt-2 text-xs font-semibold text-error">
          ✕ {renameError}
        </p>
      )}
      <TableErrors prefix={['motors']} rowName={(i) => `Motor ${i + 1}${config.motors[i] ? ` (${config.motors[i].name})` : ''}`} />
    </Panel>
  );
}

/** A motor's name is committed when the field is left (or Enter pressed), so wheels and drivers follow once. */
function MotorNameCell({ index, name, disabled, onRename }: { index: number; name: string; disabled: boolean; onRename: (name: string) => boolean }) {
  const [text, setText] = useState(name);
  useEffect(() => setText(name), [name]);
  const commit = () => {
    if (text.trim() !== name && !onRename(text)) setText(name);
  };
  return (
    <input
      type="text"
      aria-label={`Name of motor ${name}`}
      data-field={`motors.${index}.name`}
      value={text}
      disabled={disabled}
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') commit();
        if (e.key === 'Escape') setText(name);
      }}
      className={cx(compactInputClasses, 'w-32 border-rule-strong')}
    />
  );
}
