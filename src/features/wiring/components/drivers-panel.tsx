import type { PinDemand } from '@shared/pins/pin-demands';
import type { DriverPwmAdvice } from '@shared/pins/pwm-advice';
import type { Problem } from '@shared/problems/problem';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { Button } from '@/components/ui/button';
import { addDriver, freeMotors } from '../lib/driver-edits';
import type { PinChoices } from '../lib/pin-choices';
import { fieldDomId } from '../lib/wiring-problems';
import { DriverCard } from './driver-card';

export interface DriversPanelProps {
  config: RobotConfig;
  demands: PinDemand[];
  choices: Map<string, PinChoices>;
  advice: DriverPwmAdvice[];
  problems: Problem[];
  canEdit: boolean;
  onChange: (next: RobotConfig) => void;
  onRolePin: (demand: PinDemand, pin: string | null) => void;
  onRoleLock: (demand: PinDemand, locked: boolean) => void;
}

/** Every motor driver, and adding one for motors that have none. */
export function DriversPanel({ config, advice, ...rest }: DriversPanelProps) {
  const free = freeMotors(config);
  const full = config.wiring.drivers.length >= 8;
  const id = fieldDomId(['wiring', 'drivers']);
  const add = () => {
    const next = addDriver(config);
    if (next) rest.onChange(next);
  };
  return (
    <section aria-labelledby={`${id}-title`} className="space-y-3">
      <div id={id} data-field="wiring.drivers" className="flex flex-wrap items-end justify-between gap-2 rounded-md">
        <div>
          <h2 id={`${id}-title`} className="text-lg font-semibold text-ink">
            Motor drivers
          </h2>
          <p className="text-sm text-ink-muted">
            {free.length > 0
              ? `Not on a driver yet: ${free.map((m) => `“${m}”`).join(', ')}.`
              : 'Every motor is on a driver channel.'}
          </p>
        </div>
        {rest.canEdit && (
          <Button
            variant="secondary"
            size="sm"
            onClick={add}
            disabled={free.length === 0 || full}
            title={full ? 'At most 8 drivers' : free.length === 0 ? 'Every motor is on a driver already' : undefined}
          >
            Add driver
          </Button>
        )}
      </div>
      {config.wiring.drivers.map((_, index) => (
        <DriverCard key={index} config={config} index={index} advice={advice[index]} {...rest} />
      ))}
    </section>
  );
}
