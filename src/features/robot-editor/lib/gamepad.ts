import type { Sticks } from '@shared/kinematics/mixing';

/**
 * USB gamepads through the browser Gamepad API. With the "standard" mapping (W3C Gamepad,
 * "Remapping") axes 0/1 are the left stick's x/y and axes 2/3 the right stick's, x to the
 * right and y DOWN. The preview uses the same hands as the on-screen sticks:
 *   right stick up/down → forward (up = ahead), right stick sideways → strafe (right = right),
 *   left stick sideways → yaw (right = turn right). The left stick's up/down is not used.
 */
export const GAMEPAD_AXES = { yaw: 0, strafe: 2, forward: 3 } as const;

/** Pads rest a little off centre (common practice: a dead zone of about a tenth of travel). */
export const GAMEPAD_DEADZONE = 0.1;

/** Radial dead zone with rescaling, so the output still grows from 0 at the edge to 1 at the end. */
export function applyStickDeadzone(x: number, y: number, deadzone = GAMEPAD_DEADZONE): { x: number; y: number } {
  const magnitude = Math.hypot(x, y);
  if (!(magnitude > deadzone)) return { x: 0, y: 0 };
  const scaled = Math.min(1, (magnitude - deadzone) / (1 - deadzone)) / magnitude;
  return { x: x * scaled, y: y * scaled };
}

type PadLike = Pick<Gamepad, 'axes' | 'connected'> & { id?: string; mapping?: string };

/** The first connected pad in `navigator.getGamepads()` order, or null. */
export function firstPad<P extends PadLike>(pads: readonly (P | null)[] | null | undefined): P | null {
  return pads?.find((p): p is P => !!p && p.connected && p.axes.length >= 4) ?? null;
}

/** Stick commands from a pad's axes, after the dead zone. */
export function gamepadSticks(pad: PadLike, deadzone = GAMEPAD_DEADZONE): Sticks {
  const axis = (i: number) => (Number.isFinite(pad.axes[i]) ? Math.max(-1, Math.min(1, pad.axes[i])) : 0);
  const right = applyStickDeadzone(axis(GAMEPAD_AXES.strafe), axis(GAMEPAD_AXES.forward), deadzone);
  const left = applyStickDeadzone(axis(GAMEPAD_AXES.yaw), 0, deadzone);
  return { forward: -right.y + 0, strafe: right.x + 0, yaw: left.x + 0 };
}

/** Per axis, whichever source is pushed further (on-screen or keyboard sticks, and a pad). */
export function combineSticks(a: Sticks, b: Sticks | null): Sticks {
  if (!b) return a;
  const pick = (p: number, q: number) => (Math.abs(q) > Math.abs(p) ? q : p);
  return { forward: pick(a.forward, b.forward), strafe: pick(a.strafe, b.strafe), yaw: pick(a.yaw, b.yaw) };
}
