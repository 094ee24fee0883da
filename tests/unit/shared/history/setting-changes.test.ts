import { describe, expect, it } from 'vitest';
import { changeLabel, settingChanges, settingValueWords } from '@shared/history/setting-changes';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { makeConfig } from '../../../factories/engine';

const mecanum = () => makeConfig('quad-mecanum');
const edited = (edit: (c: RobotConfig) => void) => {
  const c = structuredClone(mecanum());
  edit(c);
  return c;
};
const texts = (a: RobotConfig, b: RobotConfig) => settingChanges(a, b).map((c) => c.text);

describe('setting changes in words', () => {
  it('names a wheel by its name and a switch by on and off', () => {
    const before = mecanum();
    const name = before.chassis.wheels[0].name;
    const after = edited((c) => (c.chassis.wheels[0].reversed = true));
    expect(settingChanges(before, after)).toEqual([
      {
        path: ['chassis', 'wheels', 0, 'reversed'],
        section: 'Chassis',
        subject: `${name} wheel`,
        field: 'reversed',
        kind: 'changed',
        from: 'off',
        to: 'on',
        text: `${name} wheel: reversed off → on`,
      },
    ]);
  });

  it('gives units and percentages', () => {
    const after = edited((c) => {
      c.safety.failsafeTimeoutMs = 150;
      c.controls.axes.yaw.expo = 0.45;
      c.chassis.wheels[1].radiusMm = 32.5;
    });
    const wheel = mecanum().chassis.wheels[1].name;
    expect(texts(mecanum(), after)).toEqual([
      `${wheel} wheel: radius ${mecanum().chassis.wheels[1].radiusMm} mm → 32.5 mm`,
      `Yaw axis: expo ${mecanum().controls.axes.yaw.expo * 100} % → 45 %`,
      'Safety: failsafe timeout 250 ms → 150 ms',
    ]);
  });

  it('names boards, sources and driver kinds by their full names', () => {
    const after = edited((c) => (c.wiring.board = 'mega2560'));
    expect(texts(mecanum(), after)).toEqual([`Wiring: board Arduino Uno R3 → Arduino Mega 2560`]);
  });

  it('names a driver pin by its role', () => {
    const after = edited((c) => (c.wiring.drivers[0].pins['a.fwd'] = { pin: 'D5', locked: true }));
    expect(texts(mecanum(), after)).toEqual([
      'Driver 1: A PWM forward pin unassigned → D5',
      'Driver 1: A PWM forward pin locked off → on',
    ]);
  });

  it('says when a pin role appears', () => {
    const after = edited((c) => (c.wiring.drivers[0].pins['stby'] = { pin: 'D7', locked: true }));
    expect(texts(mecanum(), after)).toEqual(['Driver 1: stby pin added (D7, locked)']);
  });

  it('lists the rates of the rate switch', () => {
    const after = edited((c) => (c.controls.rateSwitch.rates = [0.35, 0.65, 1]));
    expect(texts(mecanum(), after)).toEqual(['Rate switch: rates 50 %, 100 % → 35 %, 65 %, 100 %']);
  });

  it('says when a whole item is added or removed', () => {
    const after = edited((c) => {
      c.controls.channels.push({ number: 8, name: 'Aux', low: 1000, centre: 1500, high: 2000 });
    });
    expect(texts(mecanum(), after)).toEqual(['Channel 8 (Aux) added']);
    expect(texts(after, mecanum())).toEqual(['Channel 8 (Aux) removed']);
  });

  it('says "none" for a channel that is no longer mapped', () => {
    const after = edited((c) => (c.controls.axes.strafe.channel = null));
    expect(texts(mecanum(), after)).toEqual([`Strafe axis: channel ${mecanum().controls.axes.strafe.channel} → none`]);
  });

  it('puts the robot name under Robot', () => {
    const after = edited((c) => (c.name = 'Aisle Scout II'));
    expect(settingChanges(mecanum(), after)[0]).toMatchObject({
      section: 'Robot',
      text: `Robot: name ${mecanum().name} → Aisle Scout II`,
    });
  });

  it('finds nothing between a configuration and its copy', () => {
    expect(settingChanges(mecanum(), structuredClone(mecanum()))).toEqual([]);
  });

  it('names a changed layout parameter, with the unit read from its key', () => {
    const after = edited((c) => (c.chassis.params.wheelbaseMm = 180));
    expect(settingChanges(mecanum(), after)).toMatchObject([
      { subject: 'Chassis', field: 'layout wheelbase', from: '160 mm', to: '180 mm' },
    ]);
  });

  it('names a channel by its number and its name', () => {
    const after = edited((c) => (c.controls.channels[1].centre = 1000));
    expect(texts(mecanum(), after)).toEqual(['Channel 2 (Forward): centre 1500 → 1000']);
  });

  it('names a field of some other JSON value by its last key', () => {
    expect(settingChanges({ a: { radiusMm: 30 } }, { a: { radiusMm: 31 } })).toMatchObject([
      { path: ['a', 'radiusMm'], field: 'radius', from: '30 mm', to: '31 mm' },
    ]);
  });

  it('puts a value at a path in words as a change there would read it', () => {
    expect(settingValueWords(['safety', 'failsafeTimeoutMs'], 300, mecanum(), mecanum())).toBe('300 ms');
    expect(settingValueWords(['controls', 'channels', 9], undefined, mecanum(), mecanum())).toBeNull();
  });
});

describe('changeLabel', () => {
  it('puts the section, the part and the field on one line', () => {
    const after = edited((c) => (c.chassis.wheels[2].radiusMm = 35));
    expect(changeLabel(settingChanges(mecanum(), after)[0])).toBe('Chassis › Rear right wheel › radius');
  });

  it('says a section once when the setting belongs to the section itself', () => {
    const after = edited((c) => (c.safety.rampPerSecond = 6));
    expect(changeLabel(settingChanges(mecanum(), after)[0])).toBe('Safety › ramp limit');
  });

  it('calls the top-level name the robot name', () => {
    const after = edited((c) => (c.name = 'Moss Crawler'));
    expect(changeLabel(settingChanges(mecanum(), after)[0])).toBe('Robot › name');
  });
});
