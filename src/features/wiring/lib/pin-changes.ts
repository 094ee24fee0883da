import { collectDemands } from '@shared/pins/pin-demands';
import type { RobotConfig } from '@shared/schemas/robot-config';

export interface PinChange {
  key: string;
  label: string;
  from: string | null;
  to: string | null;
}

/** Roles whose pin differs between two versions of a configuration, in role order. */
export function pinChanges(before: RobotConfig, after: RobotConfig): PinChange[] {
  const old = new Map(collectDemands(before).map((d) => [d.key, d.pin]));
  return collectDemands(after)
    .filter((d) => (old.get(d.key) ?? null) !== d.pin)
    .map((d) => ({ key: d.key, label: d.label, from: old.get(d.key) ?? null, to: d.pin }));
}

/** "Driver 1 A PWM: D9", "status LED: D10 → D13", "bench-test switch: cleared (was A3)". */
export function describePinChange(change: PinChange): string {
  if (change.to === null) return `${change.label}: cleared (was ${change.from})`;
  if (change.from === null) return `${change.label}: ${change.to}`;
  return `${change.label}: ${change.from} → ${change.to}`;
}
