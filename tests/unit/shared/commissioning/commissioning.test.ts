import { describe, expect, it } from 'vitest';
import {
  applyFindings,
  benchTestSteps,
  flipMotor,
  swapMotors,
  type BenchFinding,
} from '@shared/commissioning/commissioning';
import { computeMixing } from '@shared/kinematics/mixing';
import { buildStarterConfig } from '@shared/starter';

const mecanum = () => buildStarterConfig({ layout: 'quad-mecanum', driver: 'pwm-in1-in2-stby' });
const allFine = (names: string[]): BenchFinding[] =>
  names.map((motor) => ({ motor, turned: motor, direction: 'expected' }));

describe('benchTestSteps', () => {
  it('runs the motors in configuration order with the firmware console line', () => {
    const steps = benchTestSteps(mecanum());
    expect(steps.map((s) => s.motor)).toEqual(['Front left', 'Front right', 'Rear right', 'Rear left']);
    expect(steps[1].consoleLine).toBe('bench motor 2/4 "Front right" forward');
    expect(steps[0]).toMatchObject({ duty: 0.3, ms: 1000 });
  });
});

describe('flipMotor', () => {
  it('toggles reversed on every wheel of that motor and no other', () => {
    const config = buildStarterConfig({ layout: 'skid-steer' });
    const twoPerSide = {
      ...config,
      chassis: {
        ...config.chassis,
        wheels: config.chassis.wheels.map((w) => ({ ...w, motor: w.name.endsWith('left') ? 'Front left' : w.motor })),
      },
    };
    const flipped = flipMotor(twoPerSide, 'Front left');
    expect(flipped.chassis.wheels.map((w) => [w.name, w.reversed])).toEqual([
      ['Front left', true],
      ['Front right', false],
      ['Rear right', false],
      ['Rear left', true],
    ]);
  });

  it('negates that motor’s row of the mixing matrix', () => {
    const config = mecanum();
    const before = computeMixing(config).matrix;
    const after = computeMixing(flipMotor(config, 'Rear left')).matrix;
    expect(after[3].map((v) => v + 0)).toEqual(before[3].map((v) => -v + 0));
    expect(after[0]).toEqual(before[0]);
  });

  it('undoes itself when applied twice', () => {
    const config = mecanum();
    expect(flipMotor(flipMotor(config, 'Front left'), 'Front left')).toEqual(config);
  });
});

describe('swapMotors', () => {
  it('exchanges the two motors’ places on the drivers and keeps the wheels', () => {
    const config = mecanum();
    const swapped = swapMotors(config, 'Front left', 'Rear left');
    expect(swapped.wiring.drivers.map((d) => d.motors)).toEqual([
      ['Rear left', 'Front right'],
      ['Rear right', 'Front left'],
    ]);
    expect(swapped.chassis.wheels).toEqual(config.chassis.wheels);
  });
});

describe('applyFindings', () => {
  it('changes nothing when every motor turned the expected way on its corner', () => {
    const config = mecanum();
    const result = applyFindings(config, allFine(config.motors.map((m) => m.name)));
    expect(result).toEqual({ ok: true, config, actions: [], message: null });
  });

  it('flips a motor that turned the wrong way and says so in the message', () => {
    const config = mecanum();
    const findings = allFine(config.motors.map((m) => m.name));
    findings[2] = { motor: 'Rear right', turned: 'Rear right', direction: 'opposite' };
    const result = applyFindings(config, findings);
    if (!result.ok) throw new Error(result.reason);
    expect(result.config.chassis.wheels.find((w) => w.name === 'Rear right')?.reversed).toBe(true);
    expect(result.message).toBe('Commissioning: flipped Rear right');
  });

  it('swaps a crossed pair and flips the wheels that actually turned the wrong way', () => {
    const config = mecanum();
    const findings: BenchFinding[] = [
      { motor: 'Front left', turned: 'Front right', direction: 'opposite' },
      { motor: 'Front right', turned: 'Front left', direction: 'expected' },
      { motor: 'Rear right', turned: 'Rear right', direction: 'expected' },
      { motor: 'Rear left', turned: 'Rear left', direction: 'expected' },
    ];
    const result = applyFindings(config, findings);
    if (!result.ok) throw new Error(result.reason);
    expect(result.config.wiring.drivers[0].motors).toEqual(['Front right', 'Front left']);
    expect(result.config.chassis.wheels.find((w) => w.name === 'Front right')?.reversed).toBe(true);
    expect(result.config.chassis.wheels.find((w) => w.name === 'Front left')?.reversed).toBe(false);
    expect(result.message).toBe('Commissioning: swapped Front left and Front right; flipped Front right');
  });

  it('follows a three-way mix-up round the cycle', () => {
    const config = mecanum();
    const result = applyFindings(config, [
      { motor: 'Front left', turned: 'Front right', direction: 'expected' },
      { motor: 'Front right', turned: 'Rear right', direction: 'expected' },
      { motor: 'Rear right', turned: 'Front left', direction: 'expected' },
      { motor: 'Rear left', turned: 'Rear left', direction: 'expected' },
    ]);
    if (!result.ok) throw new Error(result.reason);
    expect(result.config.wiring.drivers.flatMap((d) => d.motors)).toEqual([
      'Front right',
      'Rear right',
      'Front left',
      'Rear left',
    ]);
    expect(result.actions).toEqual([
      'moved channels Front left to Front right, Front right to Rear right, Rear right to Front left',
    ]);
  });

  it('refuses when two motors are said to turn the same wheels', () => {
    const config = mecanum();
    const findings = allFine(config.motors.map((m) => m.name));
    findings[0] = { motor: 'Front left', turned: 'Rear left', direction: 'expected' };
    const result = applyFindings(config, findings);
    expect(result).toEqual({ ok: false, reason: expect.stringContaining('“Rear left”') });
  });

  it('refuses when a motor did not turn at all, pointing at the hardware', () => {
    const config = mecanum();
    const findings = allFine(config.motors.map((m) => m.name));
    findings[1] = { motor: 'Front right', turned: null, direction: 'expected' };
    const result = applyFindings(config, findings);
    expect(result).toEqual({
      ok: false,
      reason: expect.stringMatching(/Nothing turned for “Front right”.*power, driver and pins/),
    });
  });

  it('asks for every motor before changing anything', () => {
    const config = mecanum();
    const result = applyFindings(config, allFine(['Front left', 'Front right']));
    expect(result).toEqual({ ok: false, reason: 'Answer the check for “Rear right”, “Rear left” first.' });
  });
});
