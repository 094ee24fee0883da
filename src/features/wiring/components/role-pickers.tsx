import type { PinDemand } from '@shared/pins/pin-demands';
import type { Problem } from '@shared/problems/problem';
import type { PinChoices } from '../lib/pin-choices';
import { problemsForRole } from '../lib/wiring-problems';
import { PinPicker } from './pin-picker';

export interface RolePickersProps {
  demands: PinDemand[];
  choices: Map<string, PinChoices>;
  problems: Problem[];
  canEdit: boolean;
  /** The label shown for a role in this list. */
  labelOf: (demand: PinDemand) => string;
  onRolePin: (demand: PinDemand, pin: string | null) => void;
  onRoleLock: (demand: PinDemand, locked: boolean) => void;
}

/** A plain list of role pickers (input, remote, status LED, bench test). */
export function RolePickers({ demands, choices, problems, canEdit, labelOf, onRolePin, onRoleLock }: RolePickersProps) {
  return (
    <div className="space-y-0.5">
      {demands.map((d) => (
        <PinPicker
          key={d.key}
          demand={d}
          label={labelOf(d)}
          choices={choices.get(d.key)!}
          problems={problemsForRole(problems, d)}
          canEdit={canEdit}
          onPin={(pin) => onRolePin(d, pin)}
          onLock={(locked) => onRoleLock(d, locked)}
        />
      ))}
    </div>
  );
}

/** "channel 1 pulse" → "Channel 1 pulse"; drops the "remote " prefix inside the remote's own list. */
export function roleLabel(demand: PinDemand): string {
  const text = demand.owner === 'remote' ? demand.label.replace(/^remote /, '') : demand.label;
  return text.charAt(0).toUpperCase() + text.slice(1);
}
