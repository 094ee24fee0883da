import { describe, expect, it } from 'vitest';
import { checkPinPlan } from '@shared/pins/check-pins';
import { collectDemands } from '@shared/pins/pin-demands';
import { robotProblems } from '@shared/problems/robot-problems';
import { describePinChange, pinChanges } from '@/features/wiring/lib/pin-changes';
import { fieldDomId, isWiringProblem, problemsForRole, targetFor } from '@/features/wiring/lib/wiring-problems';
import { unoPlan } from '../../../../fixtures/pin-plans';
import { buildConfig, withPins } from '../../../../fixtures/robot-config-factory';

describe('wiring problems', () => {
  it('keeps the drive engine’s problems out of the Wiring section', () => {
    const config = buildConfig({ layout: 'differential' });
    const all = robotProblems(config);
    expect(all.some((p) => p.code === 'pin-missing')).toBe(true);
    expect(all.filter(isWiringProblem).every((p) => !p.path.includes('chassis') && !p.path.includes('axes'))).toBe(true);
  });

  it('shows a board-wide PWM shortage in the list but not beside every PWM role', () => {
    const config = buildConfig({ board: 'uno', layout: 'quad-mecanum', driver: 'dual-pwm', source: 'ppm' });
    const problems = checkPinPlan(config);
    expect(problems.some((p) => p.code === 'too-few-pwm-pins')).toBe(true);
    const demand = collectDemands(config).find((d) => d.key === 'driver:0:a.fwd')!;
    expect(problemsForRole(problems, demand).map((p) => p.code)).toEqual(['pin-missing']);
  });

  it('finds the closest field on screen for a problem’s path', () => {
    const onScreen = new Set([fieldDomId(['wiring', 'drivers', 1]), fieldDomId(['wiring', 'drivers'])]);
    expect(targetFor(['wiring', 'drivers', 1, 'motors', 0], (id) => onScreen.has(id))).toBe(fieldDomId(['wiring', 'drivers', 1]));
    expect(targetFor(['motors', 2, 'name'], (id) => onScreen.has(id))).toBe(fieldDomId(['wiring', 'drivers']));
  });
});

describe('pin changes', () => {
  it('lists the roles whose pin moved, was set or was cleared', () => {
    const before = unoPlan();
    const after = withPins(before, { 'Driver 1/a.pwm': 'D3', 'status-led': null, 'bench-test': 'A3' });
    expect(pinChanges(before, after).map(describePinChange)).toEqual(['Driver 1 A PWM: D9 → D3', 'status LED: cleared (was D13)', 'bench-test switch: A3']);
  });
});
