import { describe, expect, it } from 'vitest';
import { checkPinPlan } from '@shared/pins/check-pins';
import { collectDemands } from '@shared/pins/pin-demands';
import { robotProblems } from '@shared/problems/robot-problems';
import { describePinChange, pinChanges } from '@/features/wiring/lib/pin-changes';
import { isWiringProblem, problemsForRole, roleFieldKey, wiringFieldFor } from '@/features/wiring/lib/wiring-problems';
import { unoPlan } from '../../../../../fixtures/pin-plans';
import { buildConfig, withPins } from '../../../../../fixtures/robot-config-factory';

describe('wiring problems', () => {
  it('keeps the drive engine’s problems out of the Wiring section', () => {
    const config = buildConfig({ layout: 'differential' });
    const all = robotProblems(config);
    expect(all.some((p) => p.code === 'pin-missing')).toBe(true);
    expect(all.filter(isWiringProblem).every((p) => !p.path.includes('chassis') && !p.path.includes('axes'))).toBe(
      true,
    );
  });

  it('shows a board-wide PWM shortage in the list but not beside every PWM role', () => {
    const config = buildConfig({ board: 'uno', layout: 'quad-mecanum', driver: 'dual-pwm', source: 'ppm' });
    const problems = checkPinPlan(config);
    expect(problems.some((p) => p.code === 'too-few-pwm-pins')).toBe(true);
    const demand = collectDemands(config).find((d) => d.key === 'driver:0:a.fwd')!;
    expect(problemsForRole(problems, demand).map((p) => p.code)).toEqual(['pin-missing']);
  });

  it('names a role’s pin picker by the path of its pin assignment', () => {
    const demands = collectDemands(unoPlan());
    const key = (k: string) => roleFieldKey(demands.find((d) => d.key === k)!);
    expect(key('driver:0:a.pwm')).toBe('wiring.drivers.0.pins.a.pwm');
    expect(key('input:ppm')).toBe('wiring.inputPins.ppm');
    expect(key('status-led')).toBe('wiring.statusLed');
  });

  it('leads a problem listed in Wiring to a field the section shows', () => {
    expect(wiringFieldFor(['wiring', 'drivers', 1, 'pins', 'a.pwm', 'pin'])).toBe('wiring.drivers.1.pins.a.pwm.pin');
    expect(wiringFieldFor(['controls', 'link', 'remotePins', 'ce', 'pin'])).toBe('controls.link.remotePins.ce.pin');
    expect(wiringFieldFor(['controls', 'source'])).toBe('wiring.inputPins');
    expect(wiringFieldFor(['motors', 2, 'name'])).toBe('wiring.drivers');
  });
});

describe('pin changes', () => {
  it('lists the roles whose pin moved, was set or was cleared', () => {
    const before = unoPlan();
    const after = withPins(before, { 'Driver 1/a.pwm': 'D3', 'status-led': null, 'bench-test': 'A3' });
    expect(pinChanges(before, after).map(describePinChange)).toEqual([
      'Driver 1 A PWM: D9 → D3',
      'status LED: cleared (was D13)',
      'bench-test switch: A3',
    ]);
  });
});
