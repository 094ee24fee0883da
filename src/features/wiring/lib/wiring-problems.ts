import type { PinDemand } from '@shared/pins/pin-demands';
import { PIN_PROBLEM_CODES } from '@shared/pins/problem-codes';
import type { Problem } from '@shared/problems/problem';

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
  return problems.filter((p) => samePath(p.path, demand.path) || (demand.pin !== null && p.roles.includes(demand.roleName) && p.pins.includes(demand.pin)));
}

/** Problems that name a board pin (on the robot's board; the remote's pins are kept apart). */
export function problemsForPin(problems: Problem[], pinId: string, remote = false): Problem[] {
  return problems.filter((p) => p.pins.includes(pinId) && isRemoteProblem(p) === remote);
}

export function isRemoteProblem(problem: Problem): boolean {
  const [a, b, c] = problem.path;
  return a === 'controls' && b === 'link' && c === 'remotePins';
}

/** The DOM id of the field a configuration path points at, so a problem can lead to it. */
export function fieldDomId(path: Path): string {
  return `wiring-field-${path.map((part) => String(part).replace(/[^A-Za-z0-9_-]/g, '_')).join('-')}`;
}

/**
 * The field to focus for a problem: the element for its path, else for the longest part of the
 * path that has one (a driver's card for a driver-wide problem), else the drivers panel. A path
 * into the controls (the input source) leads to the input's pins, shown here.
 */
export function targetFor(path: Path, exists: (id: string) => boolean): string {
  if (path[0] === 'controls' && path[1] !== 'link' && exists(fieldDomId(['wiring', 'inputPins']))) return fieldDomId(['wiring', 'inputPins']);
  for (let n = path.length; n > 0; n -= 1) {
    const id = fieldDomId(path.slice(0, n));
    if (exists(id)) return id;
  }
  return fieldDomId(['wiring', 'drivers']);
}
