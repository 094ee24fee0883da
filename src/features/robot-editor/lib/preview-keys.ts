import type { KeyMap } from '../hooks/use-held-keys';

// The drive preview's keyboard map. Holding a key pushes fully (Shift: half); letting go
// springs back to centre; Escape or Space centres at once.

/** Right stick (focused): forward/back and strafe. */
export const RIGHT_STICK_KEYS: KeyMap<'x' | 'y'> = {
  ArrowUp: { y: 1 },
  ArrowDown: { y: -1 },
  ArrowLeft: { x: -1 },
  ArrowRight: { x: 1 },
  w: { y: 1 },
  s: { y: -1 },
  a: { x: -1 },
  d: { x: 1 },
};

/** Left stick (focused): yaw only. */
export const LEFT_STICK_KEYS: KeyMap<'x' | 'y'> = {
  ArrowLeft: { x: -1 },
  ArrowRight: { x: 1 },
  a: { x: -1 },
  d: { x: 1 },
  q: { x: -1 },
  e: { x: 1 },
};

/** Floor view (focused): everything at once, for driving with one hand on the keys. */
export const ARENA_KEYS: KeyMap<'forward' | 'strafe' | 'yaw'> = {
  w: { forward: 1 },
  ArrowUp: { forward: 1 },
  s: { forward: -1 },
  ArrowDown: { forward: -1 },
  a: { strafe: -1 },
  d: { strafe: 1 },
  q: { yaw: -1 },
  ArrowLeft: { yaw: -1 },
  e: { yaw: 1 },
  ArrowRight: { yaw: 1 },
};

export const KEY_HELP = {
  arena:
    'Click or tab into the floor view, then hold W/S or ↑/↓ to drive, A/D to strafe, Q/E or ←/→ to turn. Shift for half stick; Esc centres.',
  left: 'Focused: ←/→ (or A/D, Q/E) turn. Let go to centre.',
  right: 'Focused: ↑/↓/←/→ or W/A/S/D. Shift for half. Let go to centre.',
  gamepad: 'Right stick drives and strafes, left stick sideways turns (dead zone 10 %).',
} as const;
