import type { PinDemand } from '@shared/pins/pin-demands';
import { PIN_PROBLEM_CODES } from '@shared/pins/problem-codes';
import type { Problem } from '@shared/problems/problem';
import { pathKey } from '@shared/history/field-path';

type Path = Problem['path'];

/** Problems the Wiring section shows: the pin plan's, and any that point into the wiring. */
export function isWiringProblem(problem: Problem): boolean {
  const [a, b, c] = problem.path;
  if (a === 'wiring') return true;
  if (a === 'controls' && b === 'link' && c === 'remotePins') return true;
  return problem.code in PIN_PROBLEM_CODES;
}

export function samePath(a: Path, b: Path): boolean {
  return a.length === b.length && a.every((part, i) => String(part) === String(b[i]));
}

/**
 * Problems about one role: pointing at its pin, or naming the role and its pin together (a pin
 * used twice, a timer clash). Board-wide counts that merely list every PWM role stay out.
 */
export function problemsForRole(problems: Problem[], demand: Pick<PinDemand, 'path' | 'roleName' | 'pin'>): Problem[] {
  return problems.filter(
    (p) =>
      samePath(p.path, demand.path) ||
      (demand.pin !== null && p.roles.includes(demand.roleName) && p.pins.includes(demand.pin)),
  );
}

/** Problems that name a board pin (on the robot's board; the remote's pins are kept apart). */
export function problemsForPin(problems: Problem[], pinId: string, remote = false): Problem[] {
  return problems.filter((p) => p.pins.includes(pinId) && isRemoteProblem(p) === remote);
}

export function isRemoteProblem(problem: Problem): boolean {
  const [a, b, c] = problem.path;
  return a === 'controls' && b === 'link' && c === 'remotePins';
}

/** The DOM id of a field, for its label (`htmlFor`) and descriptions. */
export function fieldDomId(path: Path): string {
  return `wiring-field-${path.map((part) => String(part).replace(/[^A-Za-z0-9_-]/g, '_')).join('-')}`;
}

/**
 * The `data-field` of a role's pin picker: the path of its pin assignment
 * (`wiring.drivers.0.pins.a.pwm`), so a problem about the pin (`….a.pwm.pin`) or its lock finds it
 * through the editor's field links, which try shorter paths until one is on screen.
 */
export function roleFieldKey(demand: Pick<PinDemand, 'path'>): string {
  const path = demand.path.at(-1) === 'pin' ? demand.path.slice(0, -1) : demand.path;
  return pathKey(path);
}

/**
 * Where a problem listed in the Wiring section leads inside the section: its own field for a
 * wiring path or a remote pin, the input's pins for a problem about the input source, else the
 * drivers (a motor that is on no driver channel).
 */
export function wiringFieldFor(path: Path): string {
  const [a, b] = path;
  if (a === 'wiring' || (a === 'controls' && b === 'link')) return pathKey(path);
  if (a === 'controls') return 'wiring.inputPins';
  return 'wiring.drivers';
}
