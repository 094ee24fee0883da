import { useId } from 'react';
import { cx } from '@/components/ui/cx';
import { Panel } from '@/components/ui/panel';
import { LAYOUT_LABELS } from '@shared/kinematics/presets';
import { DRIVE_LAYOUT_IDS, type ChassisLayout, type DriveLayoutId } from '@shared/schemas/ids';
import { changeLayout, changeParams } from '../../lib/chassis-edits';
import { checkPresetParams, presetParamFields, type PresetParamField } from '../../lib/preset-params';
import { useDraftFields } from '../fields/draft-fields-context';
import { compactInputClasses, NumberInput } from '../fields/number-input';

const LAYOUT_OPTIONS: { value: ChassisLayout; label: string }[] = [
  ...DRIVE_LAYOUT_IDS.map((id) => ({ value: id as ChassisLayout, label: `${LAYOUT_LABELS[id]} (starter layout)` })),
  { value: 'custom', label: 'Custom wheel table' },
];

/** The drive layout and, for a starter layout, its few parameters; changing them builds the wheel table again. */
export function LayoutPanel() {
  const { config, update, disabled } = useDraftFields();
  const id = useId();
  const layout = config.chassis.layout;
  return (
    <Panel
      title="Drive layout"
      titleId={`${id}-title`}
      description={
        layout === 'custom'
          ? 'Every wheel is set in the table below.'
          : 'The wheel table below is built from these parameters.'
      }
    >
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-layout`} className="text-sm font-semibold text-ink-soft">
          Layout
        </label>
        <select
          id={`${id}-layout`}
          data-field="chassis.layout"
          value={layout}
          disabled={disabled}
          onChange={(e) => update((c) => changeLayout(c, e.target.value as ChassisLayout))}
          className={cx(compactInputClasses, 'w-72 border-rule-strong py-1.5')}
        >
          {LAYOUT_OPTIONS.map((o) => (
            <option key={o.value} value={o.value}>
              {o.label}
            </option>
          ))}
        </select>
        <p className="min-h-5 text-xs leading-5 text-ink-muted">
          {layout === 'custom'
            ? 'Picking a starter layout replaces the wheel table.'
            : 'Choose “Custom wheel table” to edit each wheel; the table is kept.'}
        </p>
      </div>
      {layout !== 'custom' && (
        <div className="mt-1 grid grid-cols-[repeat(auto-fill,minmax(13rem,1fr))] gap-x-4">
          {presetParamFields(layout).map((field) => (
            <ParamField key={`${layout}-${field.key}`} layout={layout} field={field} />
          ))}
        </div>
      )}
    </Panel>
  );
}

function ParamField({ layout, field }: { layout: DriveLayoutId; field: PresetParamField }) {
  const { config, update, errors, disabled } = useDraftFields();
  const id = useId();
  const key = `chassis.params.${field.key}`;
  // The schema's messages start with the parameter's name, which is already the label.
  const raw = errors[key];
  const error = raw?.startsWith(`${field.label} `)
    ? `${raw.charAt(field.label.length + 1).toUpperCase()}${raw.slice(field.label.length + 2)}`
    : raw;
  const value = config.chassis.params[field.key];
  // The typed value goes into the draft; the wheels are rebuilt only from parameters that pass.
  const commit = (next: number | string | null) =>
    update((c) => {
      const params = { ...c.chassis.params, [field.key]: next as number | string };
      const checked = checkPresetParams(layout, params);
      return checked.ok
        ? changeParams({ ...c, chassis: { ...c.chassis, params } }, checked.params)
        : { ...c, chassis: { ...c.chassis, params } };
    });
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
        {field.label}
      </label>
      <div className="flex items-center gap-1.5">
        {field.kind === 'number' ? (
          <>
            <NumberInput
              id={id}
              data-field={key}
              value={typeof value === 'number' ? value : null}
              onCommit={commit}
              invalid={Boolean(error)}
              disabled={disabled}
              aria-describedby={`${id}-note`}
              className="w-24"
            />
            {field.unit && <span className="text-sm text-ink-muted">{field.unit}</span>}
          </>
        ) : (
          <select
            id={id}
            data-field={key}
            value={String(value ?? '')}
            disabled={disabled}
            onChange={(e) =>
              commit(field.options.find((o) => String(o.value) === e.target.value)?.value ?? e.target.value)
            }
            className={cx(compactInputClasses, 'w-full border-rule-strong py-1.5')}
          >
            {field.options.map((o) => (
              <option key={String(o.value)} value={String(o.value)}>
                {o.label}
              </option>
            ))}
          </select>
        )}
      </div>
      <p
        id={`${id}-note`}
        className={cx('min-h-5 text-xs leading-5', error ? 'font-semibold text-error' : 'text-ink-muted')}
      >
        {error
          ? `✕ ${error}`
          : field.kind === 'number' && field.min && field.max !== undefined
            ? `${field.min} to ${field.max}`
            : ''}
      </p>
    </div>
  );
}
