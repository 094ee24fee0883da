import { useEffect, useState, type ReactNode } from 'react';
import { DRIVER_KINDS, driverPinRoles } from '@shared/drivers/driver-kinds';
import type { PinDemand } from '@shared/pins/pin-demands';
import type { DriverPwmAdvice } from '@shared/pins/pwm-advice';
import type { Problem } from '@shared/problems/problem';
import { DRIVER_KIND_IDS, type DriverKindId } from '@shared/schemas/ids';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { removeDriver, setChannelMotor, setDriverKind, updateDriver } from '../lib/driver-edits';
import type { PinChoices } from '../lib/pin-choices';
import { pathKey } from '@shared/history/field-path';
import { fieldDomId, problemsForRole, samePath } from '../lib/wiring-problems';
import { DriverRatingsFields } from './driver-ratings-fields';
import { PinPicker } from './pin-picker';
import { PwmFrequencyField } from './pwm-frequency-field';
import { ProblemLine } from './severity-icon';
import { StopModeField } from './stop-mode-field';

export interface DriverCardProps {
  config: RobotConfig;
  index: number;
  demands: PinDemand[];
  choices: Map<string, PinChoices>;
  advice: DriverPwmAdvice;
  problems: Problem[];
  canEdit: boolean;
  onChange: (next: RobotConfig) => void;
  onRolePin: (demand: PinDemand, pin: string | null) => void;
  onRoleLock: (demand: PinDemand, locked: boolean) => void;
}

const selectClasses =
  'h-8 rounded-md border border-rule-strong bg-paper-raised px-2 text-sm text-ink disabled:bg-paper-sunken';

/** One motor driver: its kind, which motor is on each channel, its pins and how it runs. */
export function DriverCard({
  config,
  index,
  demands,
  choices,
  advice,
  problems,
  canEdit,
  onChange,
  onRolePin,
  onRoleLock,
}: DriverCardProps) {
  const driver = config.wiring.drivers[index];
  const kind = DRIVER_KINDS[driver.kind];
  const [notice, setNotice] = useState<string | null>(null);
  const mine = demands.filter((d) => d.owner === 'driver' && d.driverIndex === index);
  const roleLabels = Object.fromEntries(driverPinRoles(driver.kind, driver.motors.length).map((r) => [r.id, r.label]));
  const base = ['wiring', 'drivers', index];
  const ownProblems = problems.filter(
    (p) => p.path.length >= 3 && samePath(p.path.slice(0, 3), base) && !mine.some((d) => samePath(d.path, p.path)),
  );

  const changeKind = (next: DriverKindId) => {
    const change = setDriverKind(config, index, next);
    onChange(change.config);
    const parts = [
      change.dropped.length > 0 &&
        `cleared ${change.dropped.map((d) => d.pin).join(', ')} (roles this kind does not have)`,
      change.unplacedMotors.length > 0 &&
        `took ${change.unplacedMotors.map((m) => `“${m}”`).join(' and ')} off (one channel only); add a driver for it`,
    ].filter(Boolean);
    setNotice(
      `Now a ${DRIVER_KINDS[next].name} driver; pins on roles both kinds share stay${parts.length ? `; ${parts.join('; ')}` : ''}. Module ratings are back to this kind’s.`,
    );
  };

  const channelRoles = (prefix: string) => mine.filter((d) => d.roleId.startsWith(`${prefix}.`));
  const chipRoles = mine.filter((d) => !d.roleId.includes('.'));
  const picker = (d: PinDemand, label: string) => (
    <PinPicker
      key={d.key}
      demand={d}
      label={label}
      choices={choices.get(d.key)!}
      problems={problemsForRole(problems, d)}
      canEdit={canEdit}
      onPin={(pin) => onRolePin(d, pin)}
      onLock={(locked) => onRoleLock(d, locked)}
    />
  );

  return (
    <article
      id={fieldDomId(base)}
      data-field={pathKey(base)}
      aria-labelledby={`${fieldDomId(base)}-title`}
      className="rounded-lg border border-rule bg-paper-raised"
    >
      <header className="flex flex-wrap items-end gap-3 border-b border-rule px-4 py-3">
        <h3 id={`${fieldDomId(base)}-title`} className="sr-only">
          {driver.name}
        </h3>
        <div className="flex flex-col gap-1">
          <label
            htmlFor={fieldDomId([...base, 'name'])}
            className="text-xs font-semibold tracking-wide text-ink-muted uppercase"
          >
            Driver name
          </label>
          <NameInput
            id={fieldDomId([...base, 'name'])}
            field={pathKey([...base, 'name'])}
            value={driver.name}
            disabled={!canEdit}
            onCommit={(name) => onChange(updateDriver(config, index, { name }))}
          />
        </div>
        <div className="flex min-w-0 flex-1 flex-col gap-1">
          <label
            htmlFor={fieldDomId([...base, 'kind'])}
            className="text-xs font-semibold tracking-wide text-ink-muted uppercase"
          >
            Kind
          </label>
          <select
            id={fieldDomId([...base, 'kind'])}
            data-field={pathKey([...base, 'kind'])}
            value={driver.kind}
            disabled={!canEdit}
            onChange={(e) => changeKind(e.target.value as DriverKindId)}
            className={cx(selectClasses, 'w-full')}
          >
            {DRIVER_KIND_IDS.map((id) => (
              <option key={id} value={id}>
                {DRIVER_KINDS[id].name}
              </option>
            ))}
          </select>
        </div>
        {canEdit && (
          <Button
            variant="danger"
            size="sm"
            onClick={() => onChange(removeDriver(config, index))}
            aria-label={`Remove ${driver.name}`}
          >
            Remove
          </Button>
        )}
      </header>
      <div className="space-y-3 px-4 py-3">
        {notice && (
          <p
            role="status"
            className="rounded-md border border-accent/30 bg-accent-soft px-3 py-1.5 text-sm text-accent-strong"
          >
            {notice}
          </p>
        )}
        {ownProblems.map((p) => (
          <ProblemLine key={`${p.code}-${p.message}`} problem={p} />
        ))}
        {(['a', 'b'] as const).slice(0, kind.channels).map((prefix, slot) => (
          <ChannelBlock
            key={prefix}
            config={config}
            index={index}
            slot={slot as 0 | 1}
            canEdit={canEdit}
            onChange={onChange}
          >
            {channelRoles(prefix).map((d) => picker(d, roleLabels[d.roleId]?.slice(2) ?? d.roleId))}
          </ChannelBlock>
        ))}
        {chipRoles.length > 0 && (
          <div className="rounded-md border border-dashed border-rule-strong px-2 py-1.5">
            <p className="px-2 text-xs font-semibold tracking-wide text-ink-muted uppercase">Whole chip</p>
            {chipRoles.map((d) => picker(d, roleLabels[d.roleId] ?? d.roleId))}
          </div>
        )}
        <div className="grid gap-4 border-t border-rule pt-3 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.6fr)]">
          <StopModeField
            driverIndex={index}
            driver={driver}
            canEdit={canEdit}
            onChange={(stopMode) => onChange(updateDriver(config, index, { stopMode }))}
          />
          <PwmFrequencyField
            driverIndex={index}
            value={driver.pwmFrequencyHz}
            advice={advice}
            canEdit={canEdit}
            onChange={(hz) => onChange(updateDriver(config, index, { pwmFrequencyHz: hz }))}
          />
        </div>
        <DriverRatingsFields
          driverIndex={index}
          driver={driver}
          canEdit={canEdit}
          onChange={(patch) => onChange(updateDriver(config, index, patch))}
        />
      </div>
    </article>
  );
}

interface ChannelBlockProps {
  config: RobotConfig;
  index: number;
  slot: 0 | 1;
  canEdit: boolean;
  onChange: (next: RobotConfig) => void;
  children: ReactNode;
}

/** One channel of the driver: the motor on it, then its pins. */
function ChannelBlock({ config, index, slot, canEdit, onChange, children }: ChannelBlockProps) {
  const driver = config.wiring.drivers[index];
  const motor = driver.motors[slot] ?? null;
  const letter = slot === 0 ? 'A' : 'B';
  const id = fieldDomId(['wiring', 'drivers', index, 'motors', slot]);
  const holder = (name: string) => config.wiring.drivers.find((d, i) => i !== index && d.motors.includes(name));
  // An empty channel can only take a motor another driver can spare (see setChannelMotor).
  const offered = config.motors
    .map((m) => m.name)
    .filter((name) => motor !== null || !holder(name) || holder(name)!.motors.length > 1);
  return (
    <section aria-label={`Channel ${letter}`} className="rounded-md border border-rule px-2 py-1.5">
      <div className="flex flex-wrap items-center gap-2 px-2 py-1">
        <span
          className="grid size-6 place-items-center rounded bg-ink font-mono text-xs font-medium text-paper"
          aria-hidden="true"
        >
          {letter}
        </span>
        <label htmlFor={id} className="text-sm font-semibold text-ink-soft">
          Channel {letter} motor
        </label>
        <select
          id={id}
          data-field={pathKey(['wiring', 'drivers', index, 'motors', slot])}
          value={motor ?? ''}
          disabled={!canEdit}
          onChange={(e) =>
            onChange(setChannelMotor(config, index, slot, e.target.value === '' ? null : e.target.value))
          }
          className={cx(selectClasses, 'min-w-44')}
        >
          {slot === 1 && <option value="">Unused</option>}
          {offered.map((name) => (
            <option key={name} value={name}>
              {holder(name) ? `${name} (${motor === null ? 'move from' : 'swap with'} ${holder(name)!.name})` : name}
            </option>
          ))}
        </select>
      </div>
      {motor !== null ? (
        children
      ) : (
        <p className="px-2 pb-1 text-sm text-ink-muted">No motor on this channel, so it needs no pins.</p>
      )}
    </section>
  );
}

/** The driver's name, typed freely; only a non-empty name reaches the configuration. */
function NameInput({
  id,
  field,
  value,
  disabled,
  onCommit,
}: {
  id: string;
  field: string;
  value: string;
  disabled: boolean;
  onCommit: (name: string) => void;
}) {
  const [draft, setDraft] = useState(value);
  useEffect(() => setDraft((current) => (current.trim() === value ? current : value)), [value]);
  const empty = draft.trim() === '';
  return (
    <>
      <input
        id={id}
        data-field={field}
        value={draft}
        disabled={disabled}
        maxLength={40}
        aria-invalid={empty || undefined}
        onChange={(e) => {
          setDraft(e.target.value);
          if (e.target.value.trim()) onCommit(e.target.value.trim());
        }}
        className={cx(selectClasses, 'w-40 font-semibold', empty && 'border-error')}
      />
      {empty && <span className="text-[13px] font-semibold text-error">Give it a name</span>}
    </>
  );
}
