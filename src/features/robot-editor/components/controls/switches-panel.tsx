import { useId } from 'react';
import { Link } from 'react-router';
import { cx } from '@/components/ui/cx';
import { Panel } from '@/components/ui/panel';
import { rateSwitchPositions } from '@shared/shaping/switches';
import { setRatePositions } from '../../lib/controls-edits';
import { DraftNumberField, DraftSelectField } from '../fields/draft-fields';
import { useDraftFields } from '../fields/draft-fields-context';
import { channelOptions } from './channel-options';

const POSITION_WORDS = ['Low', 'Middle', 'High'];

/** Rate switch, arming switch, and what happens when a mix asks for more than 100 %. */
export function SwitchesPanel() {
  const { config, update, disabled } = useDraftFields();
  const id = useId();
  const options = channelOptions(config);
  const rate = config.controls.rateSwitch;
  const positions = rateSwitchPositions(rate);
  const positionNames = positions === 2 ? ['Low', 'High'] : POSITION_WORDS;
  return (
    <Panel title="Switches and limits" titleId={`${id}-title`}>
      <div className="grid gap-x-6 gap-y-2 lg:grid-cols-2">
        <fieldset className="min-w-0">
          <legend className="mb-1 font-semibold">Rate switch</legend>
          <div className="flex flex-wrap gap-x-3">
            <DraftSelectField
              path={['controls', 'rateSwitch', 'channel']}
              label="Channel"
              options={options}
              width="w-44"
            />
            <div className="flex flex-col gap-1">
              <label htmlFor={`${id}-positions`} className="text-sm font-semibold text-ink-soft">
                Positions
              </label>
              <select
                id={`${id}-positions`}
                data-field="controls.rateSwitch.rates"
                value={positions}
                disabled={disabled}
                onChange={(e) => update((c) => setRatePositions(c, Number(e.target.value) as 2 | 3))}
                className="w-24 rounded border border-rule-strong bg-paper-raised px-2 py-1.5"
              >
                <option value={2}>2</option>
                <option value={3}>3</option>
              </select>
            </div>
          </div>
          <div className="flex flex-wrap gap-x-3">
            {positionNames.map((name, i) => (
              <DraftNumberField
                key={`${positions}-${i}`}
                path={['controls', 'rateSwitch', 'rates', i]}
                label={`${name} rate`}
                unit="%"
                scale={100}
                width="w-16"
              />
            ))}
          </div>
        </fieldset>
        <fieldset className="min-w-0">
          <legend className="mb-1 font-semibold">Arming switch</legend>
          <div className="flex flex-wrap gap-x-3">
            <DraftSelectField
              path={['controls', 'armingSwitch', 'channel']}
              label="Channel"
              options={options}
              width="w-44"
            />
            <DraftSelectField
              path={['controls', 'armingSwitch', 'armedWhen']}
              label="Armed when the switch is"
              options={[
                { value: 'high', label: 'High' },
                { value: 'low', label: 'Low' },
              ]}
              width="w-28"
            />
          </div>
          <p className="text-xs text-ink-muted">
            Whether the motors need arming at all is set in{' '}
            <Link
              to="../safety?field=safety.armingRequired"
              relative="path"
              className="font-semibold text-accent-strong underline"
            >
              Safety
            </Link>
            .
          </p>
        </fieldset>
      </div>
      <Desaturation />
    </Panel>
  );
}

function Desaturation() {
  const { config, set, disabled } = useDraftFields();
  const mode = config.controls.desaturation;
  const choices = [
    {
      value: 'scale',
      title: 'Scale all motors down together',
      words: 'Keeps the direction of travel: the robot goes where the sticks point, a little slower.',
      worse: false,
    },
    {
      value: 'clip',
      title: 'Clip each motor at 100 %',
      words: 'Worse: the clipped motor falls behind the others, so the robot veers off the direction asked for.',
      worse: true,
    },
  ] as const;
  return (
    <fieldset className="mt-3 border-t border-rule pt-3" data-field="controls.desaturation">
      <legend className="sr-only">When a mix asks for more than 100 %</legend>
      <p className="mb-1 font-semibold">When a mix asks a motor for more than 100 %</p>
      <div className="grid gap-2 lg:grid-cols-2">
        {choices.map((c) => (
          <label
            key={c.value}
            className={cx(
              'flex gap-2 rounded border p-2 text-sm',
              mode === c.value
                ? c.worse
                  ? 'border-warn bg-warn-soft/60'
                  : 'border-accent bg-accent-soft/60'
                : 'border-rule',
            )}
          >
            <input
              type="radio"
              name="desaturation"
              value={c.value}
              checked={mode === c.value}
              disabled={disabled}
              onChange={() => set(['controls', 'desaturation'], c.value)}
              className="mt-1 accent-accent"
            />
            <span>
              <span className={cx('block font-semibold', c.worse && 'text-warn-strong')}>{c.title}</span>
              <span className="text-ink-muted">{c.words}</span>
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
