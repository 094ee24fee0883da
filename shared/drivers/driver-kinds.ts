import type { DriverKindId } from '../schemas/ids';

/** What a pin role must be able to do. */
export type PinNeed = 'pwm' | 'digital-out' | 'servo-pulse';

export interface DriverPinRole {
  /** Role id as stored in `driver.pins`: per channel `a.pwm`, `b.in1`…, per chip `stby`. */
  id: string;
  label: string;
  need: PinNeed;
  /** May be left unconnected (for example tied high on the module). */
  optional: boolean;
  /** May share one pin with the same role on other drivers of this kind (a chip's standby). */
  shareable: boolean;
}

export interface DriverKind {
  id: DriverKindId;
  name: string;
  /** Motor channels on one module or chip. */
  channels: 1 | 2;
  /** Roles repeated for each channel; ids get the channel prefix (`a.`, `b.`). */
  channelRoles: ChannelRoleTemplate[];
  /** Roles once per module or chip. */
  chipRoles: DriverPinRole[];
}

export interface ChannelRoleTemplate {
  key: string;
  label: string;
  need: PinNeed;
  optional: boolean;
}

export const CHANNEL_PREFIXES = ['a', 'b'] as const;

export const DRIVER_KINDS: Record<DriverKindId, DriverKind> = {
  'dual-pwm': {
    id: 'dual-pwm',
    name: 'Dual half-bridge, one PWM input per direction',
    channels: 1,
    channelRoles: [
      { key: 'fwd', label: 'PWM forward', need: 'pwm', optional: false },
      { key: 'rev', label: 'PWM reverse', need: 'pwm', optional: false },
      { key: 'en', label: 'Enable (both halves)', need: 'digital-out', optional: true },
    ],
    chipRoles: [],
  },
  'pwm-dir': {
    id: 'pwm-dir',
    name: 'PWM + direction',
    channels: 2,
    channelRoles: [
      { key: 'pwm', label: 'PWM', need: 'pwm', optional: false },
      { key: 'dir', label: 'Direction', need: 'digital-out', optional: false },
    ],
    chipRoles: [],
  },
  'en-in1-in2': {
    id: 'en-in1-in2',
    name: 'Enable + two inputs (L298 class)',
    channels: 2,
    channelRoles: [
      { key: 'en', label: 'Enable (PWM)', need: 'pwm', optional: false },
      { key: 'in1', label: 'Input 1', need: 'digital-out', optional: false },
      { key: 'in2', label: 'Input 2', need: 'digital-out', optional: false },
    ],
    chipRoles: [],
  },
  'pwm-in1-in2-stby': {
    id: 'pwm-in1-in2-stby',
    name: 'PWM + two inputs + standby (TB6612 class)',
    channels: 2,
    channelRoles: [
      { key: 'pwm', label: 'PWM', need: 'pwm', optional: false },
      { key: 'in1', label: 'Input 1', need: 'digital-out', optional: false },
      { key: 'in2', label: 'Input 2', need: 'digital-out', optional: false },
    ],
    chipRoles: [{ id: 'stby', label: 'Standby', need: 'digital-out', optional: false, shareable: true }],
  },
  'two-input': {
    id: 'two-input',
    name: 'Two-input bridge, both PWM (DRV8833 class)',
    channels: 2,
    channelRoles: [
      { key: 'in1', label: 'Input 1 (PWM)', need: 'pwm', optional: false },
      { key: 'in2', label: 'Input 2 (PWM)', need: 'pwm', optional: false },
    ],
    chipRoles: [],
  },
  'servo-esc': {
    id: 'servo-esc',
    name: 'Servo-pulse ESC',
    channels: 1,
    channelRoles: [{ key: 'signal', label: 'Signal (servo pulse)', need: 'servo-pulse', optional: false }],
    chipRoles: [],
  },
};

/** The pin roles of one driver with `motorCount` motors on it, in a stable order. */
export function driverPinRoles(kind: DriverKindId, motorCount: number): DriverPinRole[] {
  const spec = DRIVER_KINDS[kind];
  const perChannel = CHANNEL_PREFIXES.slice(0, Math.min(motorCount, spec.channels)).flatMap((prefix) =>
    spec.channelRoles.map((role) => ({
      id: `${prefix}.${role.key}`,
      label: `${prefix.toUpperCase()} ${role.label}`,
      need: role.need,
      optional: role.optional,
      shareable: false,
    })),
  );
  return [...perChannel, ...spec.chipRoles];
}
