import type { Controls } from '../schemas/robot-config';

/** How many positions the rate switch has: one per rate (2 or 3). */
export function rateSwitchPositions(rateSwitch: Pick<Controls['rateSwitch'], 'rates'>): number {
  return rateSwitch.rates.length;
}

/**
 * Switch position from a calibrated value in −1..1, by thresholds half-way between the
 * positions: two positions split at 0; three positions at ±0.5 (low, middle, high).
 * Position 0 is the low end.
 */
export function switchPosition(value: number, positions: number): number {
  if (positions === 2) return value >= 0 ? 1 : 0;
  if (value < -0.5) return 0;
  return value > 0.5 ? 2 : 1;
}

/** The scale the rate switch applies to every axis; no switch channel means full rate. */
export function rateSwitchScale(rateSwitch: Controls['rateSwitch'], position: number | null): number {
  if (rateSwitch.channel === null) return 1;
  // Unknown position (no reading yet): the lowest rate, the gentler choice.
  return rateSwitch.rates[position ?? 0] ?? rateSwitch.rates[0];
}

/**
 * Whether the motors may run as far as the arming switch is concerned. Without an arming
 * channel the robot is armed unless arming is required (then it can never arm, which the
 * engine reports as an error). A missing reading counts as disarmed.
 */
export function isArmed(
  armingSwitch: Controls['armingSwitch'],
  armingRequired: boolean,
  value: number | null,
): boolean {
  if (armingSwitch.channel === null) return !armingRequired;
  if (value === null) return false;
  return armingSwitch.armedWhen === 'high' ? value > 0.5 : value < -0.5;
}
