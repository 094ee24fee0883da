import { z } from 'zod';
import type { DriveLayoutId } from '../schemas/ids';
import { MotorSchema, type Chassis, type Motor, type Wheel } from '../schemas/robot-config';

// Starter layouts: a few parameters each (lengths in mm, wheel radius, top speed), turned
// into a plain wheel table. The wheel table is what the engine and the firmware use; the
// parameters are kept on the chassis so a form can show them again.
// Defaults are ordinary hobby sizes, chosen for the starter, not measured from any build.

const length = (label: string, fallback: number, min = 20, max = 2000) =>
  z
    .number()
    .min(min, `${label} must be at least ${min} mm`)
    .max(max, `${label} must be at most ${max} mm`)
    .default(fallback)
    .describe(`${label} (mm)`);
const wheelRadius = (fallback: number) => length('Wheel radius', fallback, 5, 500);
const maxRpm = (fallback: number) =>
  z
    .number()
    .positive('Max speed must be more than 0 rpm')
    .max(100000)
    .default(fallback)
    .describe('Wheel top speed (rpm)');

export const PRESET_PARAM_SCHEMAS = {
  'trio-omni': z.object({
    /** Where the lone wheel sits, seen from above; it drives at right angles to that. */
    loneWheel: z.enum(['front', 'rear', 'left', 'right']).default('front').describe('Lone wheel position'),
    element: z.enum(['omni-wheels', 'omni-tracks']).default('omni-wheels').describe('Omni wheels or omni tracks'),
    centreDistanceMm: length('Centre to wheel', 120),
    wheelRadiusMm: wheelRadius(29),
    maxRpm: maxRpm(200),
  }),
  'quad-mecanum': z.object({
    /** Roller pattern seen from above (the top rollers, not those on the ground). */
    rollers: z.enum(['x', 'o']).default('x').describe('Roller pattern seen from above'),
    wheelbaseMm: length('Wheelbase (front to rear axle)', 160),
    trackWidthMm: length('Track width (left to right wheel)', 190),
    wheelRadiusMm: wheelRadius(40),
    maxRpm: maxRpm(200),
  }),
  'quad-omni-x': z.object({
    centreDistanceMm: length('Centre to wheel', 130),
    wheelRadiusMm: wheelRadius(29),
    maxRpm: maxRpm(200),
  }),
  differential: z.object({
    element: z.enum(['wheels', 'tracks']).default('wheels').describe('Wheels or tracks'),
    trackWidthMm: length('Track width (left to right)', 200),
    wheelRadiusMm: wheelRadius(35),
    maxRpm: maxRpm(150),
  }),
  'skid-steer': z.object({
    motorsPerSide: z
      .union([z.literal(1), z.literal(2)])
      .default(2)
      .describe('Motors per side'),
    wheelbaseMm: length('Wheelbase (front to rear axle)', 160),
    trackWidthMm: length('Track width (left to right wheel)', 200),
    wheelRadiusMm: wheelRadius(35),
    maxRpm: maxRpm(150),
  }),
  'h-drive': z.object({
    trackWidthMm: length('Track width (left to right wheel)', 200),
    crossWheelXMm: z.number().min(-1000).max(1000).default(0).describe('Cross wheel ahead of centre (mm)'),
    wheelRadiusMm: wheelRadius(29),
    maxRpm: maxRpm(200),
  }),
} satisfies Record<DriveLayoutId, z.ZodObject>;

export type PresetParams<L extends DriveLayoutId> = z.infer<(typeof PRESET_PARAM_SCHEMAS)[L]>;
export type PresetParamsInput<L extends DriveLayoutId> = z.input<(typeof PRESET_PARAM_SCHEMAS)[L]>;

export const LAYOUT_LABELS: Record<DriveLayoutId, string> = {
  'trio-omni': 'Trio omni',
  'quad-mecanum': 'Quad mecanum',
  'quad-omni-x': 'Quad omni X',
  differential: 'Differential pair',
  'skid-steer': 'Four-wheel skid steer',
  'h-drive': 'H layout',
};

/** A starter chassis: the layout, its filled-in parameters and the wheel table built from them. */
export function presetChassis<L extends DriveLayoutId>(
  layout: L,
  params: PresetParamsInput<L> = {} as PresetParamsInput<L>,
): Chassis {
  const schema = PRESET_PARAM_SCHEMAS[layout] as z.ZodObject;
  const filled = schema.parse(params) as Record<string, number | string>;
  const wheels = BUILDERS[layout](filled as never).map(tidyWheel);
  return { layout, params: filled, wheels };
}

/** One motor per distinct motor name in the wheel table, in wheel order, with defaults. */
export function presetMotors(chassis: Pick<Chassis, 'wheels'>): Motor[] {
  const names = [...new Set(chassis.wheels.map((w) => w.motor))];
  return names.map((name) => MotorSchema.parse({ name }));
}

type Builder<L extends DriveLayoutId> = (p: PresetParams<L>) => Wheel[];

const BUILDERS: { [L in DriveLayoutId]: Builder<L> } = {
  'trio-omni': (p) => {
    const lone = { front: 0, left: 90, rear: 180, right: -90 }[p.loneWheel];
    const kind = p.element === 'omni-tracks' ? 'omni-track' : 'omni';
    // Order and driving directions as Lynch & Park §13.2.1: wheel i at angle φ, β = φ − 90°,
    // so the layout with the lone wheel on the left is the book's three-omni example.
    return [lone, lone - 120, lone + 120].map((phi) =>
      ringWheel(phi, p.centreDistanceMm, kind, p.wheelRadiusMm, p.maxRpm),
    );
  },
  'quad-omni-x': (p) =>
    [45, -45, -135, 135].map((phi) => ringWheel(phi, p.centreDistanceMm, 'omni', p.wheelRadiusMm, p.maxRpm)),
  'quad-mecanum': (p) => {
    const l = p.wheelbaseMm / 2;
    const w = p.trackWidthMm / 2;
    // γ per wheel for the pattern whose top rollers form an X seen from above
    // (Lynch & Park §13.2.1 four-mecanum example: yaw lever l + w). The O pattern mirrors
    // every roller (yaw lever |l − w|: a square O base cannot turn).
    const flip = p.rollers === 'x' ? 1 : -1;
    const corners: [string, number, number, number][] = [
      ['Front left', l, w, -45],
      ['Front right', l, -w, 45],
      ['Rear right', -l, -w, -45],
      ['Rear left', -l, w, 45],
    ];
    return corners.map(([name, x, y, gamma]) =>
      wheel(name, name, 'mecanum', x, y, 0, gamma * flip, p.wheelRadiusMm, p.maxRpm),
    );
  },
  differential: (p) => {
    const kind = p.element === 'tracks' ? 'track' : 'fixed';
    const w = p.trackWidthMm / 2;
    return [
      wheel('Left', 'Left', kind, 0, w, 0, 0, p.wheelRadiusMm, p.maxRpm),
      wheel('Right', 'Right', kind, 0, -w, 0, 0, p.wheelRadiusMm, p.maxRpm),
    ];
  },
  'skid-steer': (p) => {
    const l = p.wheelbaseMm / 2;
    const w = p.trackWidthMm / 2;
    const motor = (name: string, side: string) => (p.motorsPerSide === 2 ? name : side);
    return [
      wheel('Front left', motor('Front left', 'Left'), 'fixed', l, w, 0, 0, p.wheelRadiusMm, p.maxRpm),
      wheel('Front right', motor('Front right', 'Right'), 'fixed', l, -w, 0, 0, p.wheelRadiusMm, p.maxRpm),
      wheel('Rear right', motor('Rear right', 'Right'), 'fixed', -l, -w, 0, 0, p.wheelRadiusMm, p.maxRpm),
      wheel('Rear left', motor('Rear left', 'Left'), 'fixed', -l, w, 0, 0, p.wheelRadiusMm, p.maxRpm),
    ];
  },
  'h-drive': (p) => {
    const w = p.trackWidthMm / 2;
    // The side wheels are omni wheels so the cross wheel can push the robot sideways;
    // the cross wheel drives to the right so a positive strafe gives a positive command.
    return [
      wheel('Left', 'Left', 'omni', 0, w, 0, 0, p.wheelRadiusMm, p.maxRpm),
      wheel('Right', 'Right', 'omni', 0, -w, 0, 0, p.wheelRadiusMm, p.maxRpm),
      wheel('Cross', 'Cross', 'omni', p.crossWheelXMm, 0, -90, 0, p.wheelRadiusMm, p.maxRpm),
    ];
  },
};

function ringWheel(phiDeg: number, distance: number, kind: Wheel['kind'], radiusMm: number, rpm: number): Wheel {
  const phi = normalizeDeg(phiDeg);
  const rad = (phi * Math.PI) / 180;
  const name = nameAt(Math.cos(rad), Math.sin(rad));
  return wheel(
    name,
    name,
    kind,
    distance * Math.cos(rad),
    distance * Math.sin(rad),
    normalizeDeg(phi - 90),
    0,
    radiusMm,
    rpm,
  );
}

function wheel(
  name: string,
  motor: string,
  kind: Wheel['kind'],
  xMm: number,
  yMm: number,
  driveAngleDeg: number,
  rollerAngleDeg: number,
  radiusMm: number,
  maxRpm: number,
): Wheel {
  return { name, kind, xMm, yMm, driveAngleDeg, rollerAngleDeg, radiusMm, motor, reversed: false, maxRpm };
}

/** A wheel's name from where it sits: "Front", "Rear left"… */
function nameAt(x: number, y: number): string {
  const along = x > 0.3 ? 'Front' : x < -0.3 ? 'Rear' : '';
  const side = y > 0.3 ? 'left' : y < -0.3 ? 'right' : '';
  if (!along) return side.charAt(0).toUpperCase() + side.slice(1);
  return side ? `${along} ${side}` : along;
}

/** Angle in (−180°, 180°]. */
export function normalizeDeg(deg: number): number {
  const wrapped = ((((deg + 180) % 360) + 360) % 360) - 180;
  return wrapped === -180 ? 180 : wrapped;
}

/** Removes the 1e-15 residue of cos 90°; other positions stay exact so symmetric layouts stay symmetric. */
function tidyWheel(w: Wheel): Wheel {
  const tidy = (v: number) => (Math.abs(v) < 1e-9 ? 0 : v);
  return { ...w, xMm: tidy(w.xMm), yMm: tidy(w.yMm) };
}
