import { z } from 'zod';
import { describe, expect, it } from 'vitest';
import { presetChassis, presetMotors } from '@shared/kinematics/presets';
import { DRIVE_LAYOUT_IDS } from '@shared/schemas/ids';
import { ChassisSchema } from '@shared/schemas/robot-config';

describe('starter layouts', () => {
  it.each(DRIVE_LAYOUT_IDS)('builds a valid wheel table for %s', (layout) => {
    const chassis = presetChassis(layout);
    expect(ChassisSchema.safeParse(chassis).success).toBe(true);
    expect(chassis.layout).toBe(layout);
  });

  it('places trio wheels 120° apart at the centre distance, the lone one where asked', () => {
    for (const loneWheel of ['front', 'rear', 'left', 'right'] as const) {
      const { wheels } = presetChassis('trio-omni', { loneWheel, centreDistanceMm: 100 });
      const angles = wheels.map((w) => (Math.atan2(w.yMm, w.xMm) * 180) / Math.PI);
      wheels.forEach((w) => expect(Math.hypot(w.xMm, w.yMm)).toBeCloseTo(100, 9));
      const expected = { front: 0, left: 90, rear: 180, right: -90 }[loneWheel];
      expect(Math.cos(((angles[0] - expected) * Math.PI) / 180)).toBeCloseTo(1, 12);
      expect(Math.cos(((angles[1] - angles[0]) * Math.PI) / 180)).toBeCloseTo(-0.5, 12);
    }
  });

  it('names trio wheels by where they sit', () => {
    expect(presetChassis('trio-omni').wheels.map((w) => w.name)).toEqual(['Front', 'Rear right', 'Rear left']);
  });

  it('makes omni tracks when asked', () => {
    expect(presetChassis('trio-omni', { element: 'omni-tracks' }).wheels.every((w) => w.kind === 'omni-track')).toBe(
      true,
    );
    expect(presetChassis('differential', { element: 'tracks' }).wheels.every((w) => w.kind === 'track')).toBe(true);
  });

  it('mirrors every mecanum roller for the O pattern', () => {
    const x = presetChassis('quad-mecanum', { rollers: 'x' }).wheels.map((w) => w.rollerAngleDeg);
    const o = presetChassis('quad-mecanum', { rollers: 'o' }).wheels.map((w) => w.rollerAngleDeg);
    expect(x).toEqual([-45, 45, -45, 45]);
    expect(o).toEqual(x.map((g) => -g));
  });

  it('puts two skid-steer wheels on each side motor when asked', () => {
    const chassis = presetChassis('skid-steer', { motorsPerSide: 1 });
    expect(presetMotors(chassis).map((m) => m.name)).toEqual(['Left', 'Right']);
    expect(presetMotors(presetChassis('skid-steer')).map((m) => m.name)).toHaveLength(4);
  });

  it('rejects a parameter out of range, naming it', () => {
    try {
      presetChassis('differential', { wheelRadiusMm: 0 });
      expect.unreachable('a wheel radius of 0 mm was accepted');
    } catch (error) {
      expect(error).toBeInstanceOf(z.ZodError);
      expect((error as z.ZodError).issues[0]).toMatchObject({
        path: ['wheelRadiusMm'],
        message: 'Wheel radius must be at least 5 mm',
      });
    }
  });
});
