import { describe, expect, it } from 'vitest';
import { collectDemands } from '@shared/pins/pin-demands';
import { assignmentOf, setRoleLock, setRolePin } from '@/features/wiring/lib/pin-records';
import { buildConfig } from '../../../../../fixtures/robot-config-factory';

describe('pin records', () => {
  it('writes each kind of role into its own record and nowhere else', () => {
    const config = buildConfig({ board: 'rp2040-pico', source: 'nrf24' });
    let next = config;
    for (const [i, demand] of collectDemands(config).entries()) next = setRolePin(next, demand, `GP${i}`);
    const after = collectDemands(next);
    expect(after.map((d) => d.pin)).toEqual(after.map((_, i) => `GP${i}`));
    expect(next.wiring.statusLed.pin).not.toBeNull();
    expect(Object.keys(next.controls.link.remotePins)).toEqual(
      collectDemands(config)
        .filter((d) => d.owner === 'remote')
        .map((d) => d.roleId),
    );
  });

  it('keeps the lock when the pin changes and the pin when the lock changes', () => {
    const config = buildConfig();
    const place = { owner: 'driver' as const, driverIndex: 0, roleId: 'a.pwm' };
    const locked = setRoleLock(setRolePin(config, place, 'D9'), place, true);
    expect(assignmentOf(setRolePin(locked, place, 'D10'), place)).toEqual({ pin: 'D10', locked: true });
    expect(assignmentOf(setRoleLock(locked, place, false), place)).toEqual({ pin: 'D9', locked: false });
  });

  it('leaves the configuration it was given untouched', () => {
    const config = buildConfig();
    const before = JSON.stringify(config);
    setRolePin(config, { owner: 'input', driverIndex: null, roleId: 'ch1' }, 'D2');
    expect(JSON.stringify(config)).toBe(before);
  });
});
