import { describe, expect, it } from 'vitest';
import { demoRobotConfigs } from '@server/db/seed/demo-robots';
import { computeMixing } from '@shared/kinematics/mixing';
import { robotProblems } from '@shared/problems/robot-problems';
import { RobotConfigSchema, type RobotConfig } from '@shared/schemas/robot-config';

const byName = (name: string): RobotConfig => demoRobotConfigs().find((c) => c.name === name)!;
const rad = (deg: number) => (deg * Math.PI) / 180;

describe('the demo robots', () => {
  it('are the four robots of the demo scenario, each a valid configuration', () => {
    const configs = demoRobotConfigs();
    expect(configs.map((c) => c.name)).toEqual(['Greenhouse Cart', 'Aisle Scout', 'Garden Hauler', 'Bench Kiwi']);
    for (const config of configs) expect(RobotConfigSchema.safeParse(config).success).toBe(true);
  });

  it.each([
    ['Greenhouse Cart', 'trio-omni', 'nano', 'ppm', 'pwm-in1-in2-stby'],
    ['Aisle Scout', 'quad-mecanum', 'esp32-devkitc', 'sbus', 'pwm-dir'],
    ['Garden Hauler', 'differential', 'uno', 'rc-pwm', 'dual-pwm'],
    ['Bench Kiwi', 'quad-omni-x', 'rp2040-pico', 'nrf24', 'two-input'],
  ])('%s is a %s on %s with %s input and %s drivers', (name, layout, board, source, driver) => {
    const config = byName(name);
    expect(config.chassis.layout).toBe(layout);
    expect(config.wiring.board).toBe(board);
    expect(config.controls.source).toBe(source);
    expect(new Set(config.wiring.drivers.map((d) => d.kind))).toEqual(new Set([driver]));
  });

  it('puts every motor on exactly one driver channel', () => {
    for (const config of demoRobotConfigs()) {
      const onDrivers = config.wiring.drivers.flatMap((d) => d.motors).sort();
      expect(onDrivers).toEqual(config.motors.map((m) => m.name).sort());
    }
  });

  // Three omni wheels 120° apart, each driving along the tangent (common practice for this layout).
  it('spaces the Greenhouse Cart wheels 120° apart, each driving tangentially', () => {
    const wheels = byName('Greenhouse Cart').chassis.wheels;
    const angles = wheels.map((w) => (Math.atan2(w.yMm, w.xMm) * 180) / Math.PI);
    expect(angles.map((a) => Math.round((a + 360) % 360))).toEqual([0, 240, 120]);
    for (const w of wheels) {
      const along = Math.cos(rad(w.driveAngleDeg)) * w.xMm + Math.sin(rad(w.driveAngleDeg)) * w.yMm;
      expect(Math.abs(along)).toBeLessThan(0.5);
      expect(Math.hypot(w.xMm, w.yMm)).toBeCloseTo(120, 0);
    }
  });

  // Lynch & Park, Modern Robotics (2017) §13.2.1, four-mecanum example: rollers −45°, +45°,
  // −45°, +45° in the order front-left, front-right, rear-right, rear-left.
  it('sets the Aisle Scout mecanum rollers in an X seen from above', () => {
    const wheels = byName('Aisle Scout').chassis.wheels;
    expect(wheels.map((w) => w.rollerAngleDeg)).toEqual([-45, 45, -45, 45]);
    expect(wheels.map((w) => [Math.sign(w.xMm), Math.sign(w.yMm)])).toEqual([
      [1, 1],
      [1, -1],
      [-1, -1],
      [-1, 1],
    ]);
  });

  it('places the Garden Hauler tracks symmetrically either side of the centre line', () => {
    const [left, right] = byName('Garden Hauler').chassis.wheels;
    expect(left.yMm).toBe(-right.yMm);
    expect(left.yMm).toBeGreaterThan(0);
  });

  // Trade rule of thumb (common practice) for three omni wheels: forward leaves the wheel at right
  // angles to forward idle; sideways runs the two angled wheels at cos 60° = 0.5 of the straight
  // one, opposite sign; rotation runs all three equally.
  it('mixes the Greenhouse Cart as the three-omni rules of thumb say', () => {
    const { matrix } = computeMixing(byName('Greenhouse Cart'));
    const [forward, strafe, yaw] = [0, 1, 2].map((k) => matrix.map((row) => row[k]));
    expect(forward[0]).toBeCloseTo(0, 9);
    expect(strafe[1] / strafe[0]).toBeCloseTo(-0.5, 9);
    expect(strafe[2] / strafe[0]).toBeCloseTo(-0.5, 9);
    // Positions are kept to 0.1 mm, so the wheels sit equally far out to about 1 part in 10⁴.
    for (const v of yaw) expect(v).toBeCloseTo(yaw[0], 3);
    expect(Math.abs(yaw[0])).toBeGreaterThan(0.5);
  });

  it.each([
    ['Greenhouse Cart', 3],
    ['Aisle Scout', 3],
    ['Garden Hauler', 2],
    ['Bench Kiwi', 3],
  ])('gives %s a mixing of rank %i, so it drives as its layout should', (name, rank) => {
    const mixing = computeMixing(byName(name as string));
    expect(mixing.rank).toBe(rank);
    expect(mixing.canDrive && mixing.canTurn).toBe(true);
  });
});

describe('the demo robots as delivered', () => {
  it('have every pin placed, with no error from the engine, the pin plan or the power advice', () => {
    for (const config of demoRobotConfigs()) {
      const errors = robotProblems(config).filter((p) => p.severity === 'error');
      expect(errors, config.name).toEqual([]);
    }
  });
});
