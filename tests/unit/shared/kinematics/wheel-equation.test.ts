import { describe, expect, it } from 'vitest';
import { multiplyVector } from '@shared/kinematics/linear-algebra';
import { presetChassis } from '@shared/kinematics/presets';
import { wheelJacobian, wheelRow } from '@shared/kinematics/wheel-equation';
import { makeWheel } from '../../../factories/engine';

const expectRows = (actual: number[][], expected: number[][]) => {
  expect(actual).toHaveLength(expected.length);
  actual.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(expected[i][j], 9)));
};

describe('the general wheel equation', () => {
  // Lynch & Park, Modern Robotics (2017), §13.2.1, three omni wheels at distance d:
  // H(0) = (1/r)·[[−d, 1, 0], [−d, −1/2, −sin 60°], [−d, −1/2, sin 60°]], with wheel 1 at (0, d), β = 0;
  // wheel 2 at −30°, β = −120°; wheel 3 at 210°, β = 120°; all γ = 0.
  it("reproduces Modern Robotics' three-omni H(0)", () => {
    const d = 0.15;
    const r = 0.03;
    const at = (deg: number) => [
      d * 1000 * Math.cos((deg * Math.PI) / 180),
      d * 1000 * Math.sin((deg * Math.PI) / 180),
    ];
    const wheels = [
      makeWheel({ xMm: at(90)[0], yMm: at(90)[1], driveAngleDeg: 0, radiusMm: r * 1000 }),
      makeWheel({ xMm: at(-30)[0], yMm: at(-30)[1], driveAngleDeg: -120, radiusMm: r * 1000 }),
      makeWheel({ xMm: at(210)[0], yMm: at(210)[1], driveAngleDeg: 120, radiusMm: r * 1000 }),
    ];
    const s60 = Math.sin(Math.PI / 3);
    const book = [
      [-d, 1, 0],
      [-d, -0.5, -s60],
      [-d, -0.5, s60],
    ].map((row) => row.map((v) => v / r));
    expectRows(wheelJacobian(wheels), book);
  });

  it('gives the same H(0) for the trio-omni starter with its lone wheel on the left', () => {
    const { wheels } = presetChassis('trio-omni', { loneWheel: 'left', centreDistanceMm: 150, wheelRadiusMm: 30 });
    const s60 = Math.sin(Math.PI / 3);
    const book = [
      [-0.15, 1, 0],
      [-0.15, -0.5, -s60],
      [-0.15, -0.5, s60],
    ].map((row) => row.map((v) => v / 0.03));
    expectRows(wheelJacobian(wheels), book);
  });

  // Lynch & Park §13.2.1, four mecanum wheels at (±l, ±w), order front-left, front-right,
  // rear-right, rear-left: H(0) = (1/r)·[[−l−w, 1, −1], [l+w, 1, 1], [l+w, 1, −1], [−l−w, 1, 1]].
  it("reproduces Modern Robotics' four-mecanum H(0) for the X roller pattern", () => {
    const l = 0.1;
    const w = 0.12;
    const r = 0.04;
    const { wheels } = presetChassis('quad-mecanum', {
      wheelbaseMm: 2 * l * 1000,
      trackWidthMm: 2 * w * 1000,
      wheelRadiusMm: r * 1000,
    });
    const book = [
      [-l - w, 1, -1],
      [l + w, 1, 1],
      [l + w, 1, -1],
      [-l - w, 1, 1],
    ].map((row) => row.map((v) => v / r));
    expectRows(wheelJacobian(wheels), book);
  });

  // Lynch & Park §13.2.1 check values with l = 2, w = 1, r = 1: forward → (1,1,1,1);
  // vy = 1 → (−1,1,−1,1); ω = 1 → (−3,3,3,−3).
  it('gives the book check values for l = 2, w = 1, r = 1', () => {
    // Beyond the starter's size limits, so as a custom wheel table with the X pattern's rollers.
    const corner = (xMm: number, yMm: number, rollerAngleDeg: number) =>
      makeWheel({ kind: 'mecanum', xMm, yMm, rollerAngleDeg, radiusMm: 1000 });
    const h = wheelJacobian([
      corner(2000, 1000, -45),
      corner(2000, -1000, 45),
      corner(-2000, -1000, -45),
      corner(-2000, 1000, 45),
    ]);
    expectRows([multiplyVector(h, [0, 1, 0])], [[1, 1, 1, 1]]);
    expectRows([multiplyVector(h, [0, 0, 1])], [[-1, 1, -1, 1]]);
    expectRows([multiplyVector(h, [1, 0, 0])], [[-3, 3, 3, -3]]);
  });

  // Taheri, Qiao & Ghaeminezhad, "Kinematic Model of a Four Mecanum Wheeled Mobile Robot",
  // Int. J. Computer Applications 113(3), 2015, with k = lx + ly, order FL, FR, RL, RR:
  // ω_fl = (vx − vy − kω)/r, ω_fr = (vx + vy + kω)/r, ω_rl = (vx + vy − kω)/r, ω_rr = (vx − vy + kω)/r.
  it('agrees with the four-mecanum equations of Taheri et al. (2015)', () => {
    const lx = 0.095;
    const ly = 0.08;
    const r = 0.03;
    const k = lx + ly;
    const { wheels } = presetChassis('quad-mecanum', {
      wheelbaseMm: 2 * lx * 1000,
      trackWidthMm: 2 * ly * 1000,
      wheelRadiusMm: r * 1000,
    });
    const byName = Object.fromEntries(wheels.map((w) => [w.name, w]));
    for (const [vx, vy, omega] of [
      [0.3, -0.2, 0.7],
      [-0.1, 0.4, -1.3],
      [0, 0, 2],
    ]) {
      const speed = (name: string) => multiplyVector([wheelRow(byName[name])], [omega, vx, vy])[0];
      expect(speed('Front left')).toBeCloseTo((vx - vy - k * omega) / r, 9);
      expect(speed('Front right')).toBeCloseTo((vx + vy + k * omega) / r, 9);
      expect(speed('Rear left')).toBeCloseTo((vx + vy - k * omega) / r, 9);
      expect(speed('Rear right')).toBeCloseTo((vx - vy + k * omega) / r, 9);
    }
  });

  // ROS 2 controllers documentation, "Wheeled Mobile Robot Kinematics": v_l = v − ω·w/2,
  // v_r = v + ω·w/2; v = 0.5 m/s, ω = 1 rad/s, w = 0.3 m → 0.35 and 0.65 m/s.
  it('gives the differential-drive wheel speeds of the ROS 2 controllers documentation', () => {
    const r = 0.05;
    const { wheels } = presetChassis('differential', { trackWidthMm: 300, wheelRadiusMm: r * 1000 });
    const [left, right] = multiplyVector(wheelJacobian(wheels), [1, 0.5, 0]).map((u) => u * r);
    expect(left).toBeCloseTo(0.35, 12);
    expect(right).toBeCloseTo(0.65, 12);
  });

  it('negates the row of a reversed wheel', () => {
    const wheel = makeWheel({ xMm: 50, yMm: 80, driveAngleDeg: 30 });
    expect(wheelRow({ ...wheel, reversed: true })).toEqual(wheelRow(wheel).map((v) => (v === 0 ? 0 : -v)));
  });

  it('divides by cos γ so a 45° roller wheel turns √2 faster for the same push', () => {
    const omni = wheelRow(makeWheel({ xMm: 0, yMm: 0 }));
    const mecanum = wheelRow(makeWheel({ xMm: 0, yMm: 0, kind: 'mecanum', rollerAngleDeg: 45 }));
    // Forward push: cos(β + γ)/(r cos γ) = cos 45°/(r cos 45°) = 1/r, the same as the omni wheel.
    expect(mecanum[1]).toBeCloseTo(omni[1], 12);
    // Sideways push: sin 45°/(r cos 45°) = 1/r, where the omni wheel (γ = 0) does not turn.
    expect(mecanum[2]).toBeCloseTo(1 / 0.03, 9);
    expect(omni[2]).toBe(0);
  });
});
