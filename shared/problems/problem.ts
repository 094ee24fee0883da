/**
 * One thing wrong or risky in a configuration, from the drive engine or the pin check.
 * Codes are stable (tests, the command line and saved links rely on them).
 */
export interface Problem {
  severity: 'error' | 'warning';
  /** Stable kebab-case code, e.g. `pin-used-twice`. */
  code: string;
  /** Board pin ids involved (may be empty). */
  pins: string[];
  /** Role ids involved, e.g. `Left front/a.pwm` or `input/ch1` (may be empty). */
  roles: string[];
  /** A sentence a builder understands. */
  message: string;
  /** What to do about it. */
  hint: string;
  /** Path of the configuration field to show, e.g. ['wiring', 'drivers', 0, 'pins', 'a.pwm']. */
  path: (string | number)[];
}

export function hasErrors(problems: Problem[]): boolean {
  return problems.some((p) => p.severity === 'error');
}
