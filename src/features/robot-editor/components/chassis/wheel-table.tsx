import { Button } from '@/components/ui/button';
import { Panel } from '@/components/ui/panel';
import { WHEEL_KINDS, type WheelKind } from '@shared/schemas/ids';
import type { Wheel } from '@shared/schemas/robot-config';
import { addWheel, removeWheel } from '../../lib/chassis-edits';
import { CheckboxCell, NumberCell, SelectCell, TableErrors, TextCell } from '../fields/draft-cells';
import { useDraftFields } from '../fields/draft-fields-context';

export const WHEEL_KIND_WORDS: Record<WheelKind, string> = {
  omni: 'Omni wheel',
  mecanum: 'Mecanum wheel',
  fixed: 'Plain wheel',
  track: 'Track',
  'omni-track': 'Omni track',
};
const KIND_OPTIONS = WHEEL_KINDS.map((k) => ({ value: k, label: WHEEL_KIND_WORDS[k] }));

const COLUMNS: { title: string; unit?: string; hint: string }[] = [
  { title: 'Wheel', hint: 'Name' },
  { title: 'Kind', hint: 'What touches the floor' },
  { title: 'x', unit: 'mm', hint: 'Ahead of the centre' },
  { title: 'y', unit: 'mm', hint: 'Left of the centre' },
  { title: 'Drives toward', unit: '°', hint: '0 = forward, 90 = left' },
  { title: 'Rollers', unit: '°', hint: 'Mecanum ±45' },
  { title: 'Radius', unit: 'mm', hint: '' },
  { title: 'Motor', hint: 'Which motor turns it' },
  { title: 'Reversed', hint: 'Turns backwards for +' },
  { title: 'Top speed', unit: 'rpm', hint: 'At full duty' },
];

const fixed = (v: number) => `${Math.round(v * 10) / 10}`;

/**
 * The wheel table: what the engine and the firmware use. With a starter layout, the positions
 * come from its parameters (shown, not edited); a custom table is edited cell by cell.
 */
export function WheelTable() {
  const { config, update, disabled } = useDraftFields();
  const custom = config.chassis.layout === 'custom';
  const motorOptions = config.motors.map((m) => ({ value: m.name, label: m.name }));
  const wheels = config.chassis.wheels;
  return (
    <Panel
      title="Wheels"
      titleId="wheel-table-title"
      description={
        custom
          ? 'Positions from the robot’s centre; directions counter-clockwise from forward, seen from above.'
          : 'Built from the layout parameters. Names, motors and the reversed flag can still be changed here.'
      }
      actions={
        custom && !disabled ? (
          <Button size="sm" variant="secondary" onClick={() => update(addWheel)} disabled={wheels.length >= 12}>
            Add wheel
          </Button>
        ) : undefined
      }
    >
      <div className="overflow-x-auto" data-field="chassis.wheels">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Wheel table</caption>
          <thead className="border-b border-rule-strong text-xs text-ink-muted">
            <tr>
              {COLUMNS.map((c) => (
                <th
                  key={c.title}
                  scope="col"
                  className="px-1 py-1 align-bottom font-semibold first:pl-0"
                  title={c.hint}
                >
                  <span className="tracking-wide uppercase">{c.title}</span>
                  {c.unit && <span className="font-normal normal-case"> ({c.unit})</span>}
                </th>
              ))}
              {custom && (
                <th scope="col" className="w-10">
                  <span className="sr-only">Remove</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody className="divide-y divide-rule">
            {wheels.map((wheel, i) => (
              <WheelRow
                key={i}
                wheel={wheel}
                index={i}
                custom={custom}
                motorOptions={motorOptions}
                canRemove={custom && !disabled && wheels.length > 1}
                onRemove={() => update((c) => removeWheel(c, i))}
              />
            ))}
          </tbody>
        </table>
      </div>
      <TableErrors
        prefix={['chassis', 'wheels']}
        rowName={(i) => `Wheel ${i + 1}${wheels[i] ? ` (${wheels[i].name})` : ''}`}
      />
    </Panel>
  );
}

function WheelRow({
  wheel,
  index,
  custom,
  motorOptions,
  canRemove,
  onRemove,
}: {
  wheel: Wheel;
  index: number;
  custom: boolean;
  motorOptions: { value: string; label: string }[];
  canRemove: boolean;
  onRemove: () => void;
}) {
  const p = (key: keyof Wheel) => ['chassis', 'wheels', index, key];
  const who = `wheel ${index + 1}`;
  const geometry: [keyof Wheel, string][] = [
    ['xMm', 'x in mm'],
    ['yMm', 'y in mm'],
    ['driveAngleDeg', 'driving direction in degrees'],
    ['rollerAngleDeg', 'roller angle in degrees'],
    ['radiusMm', 'radius in mm'],
  ];
  return (
    <tr className="h-10">
      <td className="px-1 py-1 first:pl-0">
        <TextCell path={p('name')} label={`Name of ${who}`} width="w-28" />
      </td>
      <td className="px-1 py-1">
        {custom ? (
          <SelectCell path={p('kind')} label={`Kind of ${who}`} options={KIND_OPTIONS} width="w-32" />
        ) : (
          <span className="whitespace-nowrap">{WHEEL_KIND_WORDS[wheel.kind]}</span>
        )}
      </td>
      {geometry.map(([key, label]) => (
        <td key={key} className="px-1 py-1 tabular-nums">
          {custom ? (
            <NumberCell path={p(key)} label={`${wheel.name}: ${label}`} width="w-[4.25rem]" />
          ) : (
            <span className="inline-block w-[4.25rem] pr-2 text-right">{fixed(wheel[key] as number)}</span>
          )}
        </td>
      ))}
      <td className="px-1 py-1">
        <SelectCell
          path={p('motor')}
          label={`Motor of ${wheel.name}`}
          options={
            motorOptions.some((o) => o.value === wheel.motor)
              ? motorOptions
              : [...motorOptions, { value: wheel.motor, label: `${wheel.motor} (missing)` }]
          }
          width="w-28"
        />
      </td>
      <td className="px-1 py-1 text-center">
        <CheckboxCell path={p('reversed')} label={`${wheel.name} reversed`} />
      </td>
      <td className="px-1 py-1 tabular-nums">
        {custom ? (
          <NumberCell path={p('maxRpm')} label={`${wheel.name}: top speed in rpm`} width="w-[4.25rem]" />
        ) : (
          <span className="inline-block w-[4.25rem] pr-2 text-right">{fixed(wheel.maxRpm)}</span>
        )}
      </td>
      {custom && (
        <td className="px-1 py-1 text-right last:pr-0">
          {canRemove && (
            <Button
              size="sm"
              variant="quiet"
              onClick={onRemove}
              aria-label={`Remove ${wheel.name}`}
              title={`Remove ${wheel.name}`}
            >
              ✕
            </Button>
          )}
        </td>
      )}
    </tr>
  );
}
