import fc from 'fast-check';
import { Matrix, pseudoInverse as libraryPseudoInverse } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { pseudoInverse } from '@shared/kinematics/linear-algebra';
import { computeMixing, desaturate, forwardKinematics, mixSticks } from '@shared/kinematics/mixing';
import { wheelJacobian } from '@shared/kinematics/wheel-equation';
import { DRIVE_LAYOUT_IDS } from '@shared/schemas/ids';
import type { Wheel } from '@shared/schemas/robot-config';
import { makeConfig, makeCustomConfig, makeWheel } from '../../../factories/engine';
import { seededRandom } from '../../../factories/random';

/** A random wheel table of three to six omni or mecanum wheels. */
function randomLayout(seed: number): Wheel[] {
  const random = seededRandom(seed);
  const count = 3 + Math.floor(random() * 4);
  return Array.from({ length: count }, (_, i) =>
    makeWheel({
      name: `W${i}`,
      motor: `M${i}`,
      kind: random() < 0.5 ? 'omni' : 'mecanum',
      xMm: (random() - 0.5) * 600,
      yMm: (random() - 0.5) * 600,
      driveAngleDeg: random() * 360 - 180,
      rollerAngleDeg: random() < 0.5 ? 0 : random() < 0.5 ? 45 : -45,
      radiusMm: 20 + random() * 60,
      maxRpm: 100 + random() * 300,
    }),
  );
}

describe('the pseudo-inverse', () => {
  // Checked against ml-matrix (a general-purpose matrix library on npm, SVD-based
  // pseudoInverse), computed independently here, for random wheel tables.
  it.each(Array.from({ length: 25 }, (_, i) => i + 1))('matches ml-matrix for random layout %i', (seed) => {
    const h = wheelJacobian(randomLayout(seed));
    const ours = pseudoInverse(h).inverse;
    const theirs = libraryPseudoInverse(new Matrix(h)).to2DArray();
    ours.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(theirs[i][j], 8)));
  });

  it('matches ml-matrix for the mixing of a random layout, through the motor rows', () => {
    const mixing = computeMixing(makeCustomConfig(randomLayout(99)));
    const theirs = libraryPseudoInverse(new Matrix(mixing.twistMatrix)).to2DArray();
    mixing.twistInverse.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(theirs[i][j], 8)));
  });

  it('matches ml-matrix on a rank-deficient layout (a differential pair)', () => {
    const h = wheelJacobian(makeConfig('differential').chassis.wheels);
    const ours = pseudoInverse(h);
    expect(ours.rank).toBe(2);
    const theirs = libraryPseudoInverse(new Matrix(h), 1e-9).to2DArray();
    ours.inverse.forEach((row, i) => row.forEach((v, j) => expect(v).toBeCloseTo(theirs[i][j], 9)));
  });

  // Lynch & Park §13.2.1: F = H(0)⁺ = (r/4)·[[−1/(l+w), 1/(l+w), 1/(l+w), −1/(l+w)], [1,1,1,1], [−1,1,−1,1]].
  it("reproduces Modern Robotics' four-mecanum F", () => {
    const { wheels } = makeConfig('quad-mecanum').chassis;
    const l = 0.08;
    const w = 0.095;
    const r = 0.04;
    const k = 1 / (l + w);
    const book = [
      [-k, k, k, -k],
      [1, 1, 1, 1],
      [-1, 1, -1, 1],
    ].map((row) => row.map((v) => (v * r) / 4));
    pseudoInverse(wheelJacobian(wheels)).inverse.forEach((row, i) =>
      row.forEach((v, j) => expect(v).toBeCloseTo(book[i][j], 12)),
    );
  });
});

const stick = fc.double({ min: -1, max: 1, noNaN: true });
const sticks = fc.record({ forward: stick, strafe: stick, yaw: stick });
const commandList = fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 1, maxLength: 8 });

describe('desaturation', () => {
  it('keeps scaled commands within −1..1 and in the same ratio (the direction of travel)', () => {
    fc.assert(
      fc.property(commandList, (commands) => {
        const out = desaturate(commands, 'scale');
        const factor = Math.max(1, ...commands.map(Math.abs));
        out.forEach((c, i) => {
          expect(Math.abs(c)).toBeLessThanOrEqual(1);
          expect(c).toBeCloseTo(commands[i] / factor, 12);
        });
      }),
    );
  });

  it('keeps clipped commands within −1..1 and leaves those inside untouched', () => {
    fc.assert(
      fc.property(commandList, (commands) => {
        desaturate(commands, 'clip').forEach((c, i) => {
          expect(Math.abs(c)).toBeLessThanOrEqual(1);
          if (Math.abs(commands[i]) <= 1) expect(c).toBe(commands[i]);
        });
      }),
    );
  });

  it('bends the direction when clipping but not when scaling (drive and turn at full stick)', () => {
    const mixing = computeMixing(makeConfig('differential'));
    const scaled = forwardKinematics(mixing, mixSticks(mixing, { forward: 1, strafe: 0, yaw: 0.5 }, 'scale')).sticks;
    const clipped = forwardKinematics(mixing, mixSticks(mixing, { forward: 1, strafe: 0, yaw: 0.5 }, 'clip')).sticks;
    expect(scaled.yaw / scaled.forward).toBeCloseTo(0.5, 12);
    expect(clipped.yaw / clipped.forward).not.toBeCloseTo(0.5, 2);
  });
});

describe('mixing then forward kinematics', () => {
  const fullRank = DRIVE_LAYOUT_IDS.filter((layout) => computeMixing(makeConfig(layout)).rank === 3);

  it('covers the four full-rank starter layouts', () => {
    expect(fullRank).toEqual(['trio-omni', 'quad-mecanum', 'quad-omni-x', 'h-drive']);
  });

  it.each(fullRank)('returns the commanded motion, scaled only by desaturation, for %s', (layout) => {
    const mixing = computeMixing(makeConfig(layout));
    fc.assert(
      fc.property(sticks, (s) => {
        const raw = mixing.matrix.map((row) => row[0] * s.forward + row[1] * s.strafe + row[2] * s.yaw);
        const factor = 1 / Math.max(1, ...raw.map(Math.abs));
        const motion = forwardKinematics(mixing, mixSticks(mixing, s));
        expect(motion.sticks.forward).toBeCloseTo(s.forward * factor, 9);
        expect(motion.sticks.strafe).toBeCloseTo(s.strafe * factor, 9);
        expect(motion.sticks.yaw).toBeCloseTo(s.yaw * factor, 9);
        expect(motion.fighting).toBeLessThan(1e-9);
      }),
    );
  });

  it('returns the commanded motion for random full-rank custom layouts', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), sticks, (seed, s) => {
        const mixing = computeMixing(makeCustomConfig(randomLayout(seed)));
        fc.pre(mixing.rank === 3);
        const small = { forward: s.forward / 4, strafe: s.strafe / 4, yaw: s.yaw / 4 };
        const raw = mixing.matrix.map((row) => row[0] * small.forward + row[1] * small.strafe + row[2] * small.yaw);
        const factor = 1 / Math.max(1, ...raw.map(Math.abs));
        const back = forwardKinematics(mixing, mixSticks(mixing, small)).sticks;
        expect(back.forward).toBeCloseTo(small.forward * factor, 7);
        expect(back.strafe).toBeCloseTo(small.strafe * factor, 7);
        expect(back.yaw).toBeCloseTo(small.yaw * factor, 7);
      }),
      { numRuns: 200 },
    );
  });

  it('drops the strafe part for a layout that cannot strafe', () => {
    const mixing = computeMixing(makeConfig('differential'));
    const back = forwardKinematics(mixing, mixSticks(mixing, { forward: 0.4, strafe: 0.9, yaw: 0.2 })).sticks;
    expect(back.strafe).toBe(0);
    expect(back.forward).toBeCloseTo(0.4, 12);
    expect(back.yaw).toBeCloseTo(0.2, 12);
  });
});
