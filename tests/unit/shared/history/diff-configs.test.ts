import { describe, expect, it } from 'vitest';
import { diffConfigs, valueWords } from '@shared/history/diff-configs';
import { buildStarterConfig } from '@shared/starter';
import { robotConfig } from '../../../factories/robot-config';

const starter = () => buildStarterConfig({ layout: 'quad-mecanum', board: 'esp32-devkitc', input: 'sbus', driver: 'pwm-dir' });

describe('diffConfigs', () => {
  it('finds nothing between a configuration and its copy', () => {
    expect(diffConfigs(starter(), structuredClone(starter()))).toEqual([]);
  });

  it('names a changed wheel field by the wheel and the field, with its unit', () => {
    const before = starter();
    const after = structuredClone(before);
    after.chassis.wheels[2].radiusMm = 35;
    const [change] = diffConfigs(before, after);
    expect(change).toMatchObject({
      path: ['chassis', 'wheels', 2, 'radiusMm'],
      label: 'Chassis › wheel “Rear right” › radius',
      kind: 'changed',
      before: 40,
      after: 35,
      beforeWords: '40 mm',
      afterWords: '35 mm',
    });
  });

  it('puts booleans in words', () => {
    const before = starter();
    const after = structuredClone(before);
    after.chassis.wheels[0].reversed = true;
    expect(diffConfigs(before, after)[0]).toMatchObject({ beforeWords: 'no', afterWords: 'yes', label: 'Chassis › wheel “Front left” › reversed' });
  });

  it('names a channel by its number', () => {
    const before = starter();
    const after = structuredClone(before);
    after.controls.channels[1].centre = 1000;
    expect(diffConfigs(before, after)[0].label).toBe('Controls › channel 2 › centre');
  });

  it('reports a list whose length changed as one change of the whole list', () => {
    const before = robotConfig();
    const after = structuredClone(before);
    after.controls.channels.push({ number: 3, name: 'Mode', low: 1000, centre: 1500, high: 2000 });
    const changes = diffConfigs(before, after);
    expect(changes).toHaveLength(1);
    expect(changes[0]).toMatchObject({
      path: ['controls', 'channels'],
      beforeWords: '2: Steering (1), Throttle (2)',
      afterWords: '3: Steering (1), Throttle (2), Mode (3)',
    });
  });

  it('reports a key that appears as added and one that disappears as removed', () => {
    const before = { pins: { 'a.pwm': { pin: 'D9' } } };
    const after = { pins: { 'b.pwm': { pin: 'D10' } } };
    expect(diffConfigs(before, after).map((c) => [c.path.join('.'), c.kind])).toEqual([
      ['pins.a.pwm.pin', 'removed'],
      ['pins.b.pwm.pin', 'added'],
    ]);
  });

  it('calls the top-level name the robot name', () => {
    const before = robotConfig();
    expect(diffConfigs(before, { ...before, name: 'Moss Crawler' })[0]).toMatchObject({ label: 'Robot name', beforeWords: 'Test Rover', afterWords: 'Moss Crawler' });
  });

  it('reads units from the ending of a starter-layout parameter', () => {
    const before = starter();
    const after = structuredClone(before);
    after.chassis.params.wheelbaseMm = 180;
    expect(diffConfigs(before, after)[0]).toMatchObject({ label: 'Chassis › layout parameters › wheelbase', afterWords: '180 mm' });
  });

  it('compares a list of plain values as one value', () => {
    const before = starter();
    const after = structuredClone(before);
    after.controls.rateSwitch.rates = [0.4, 1];
    expect(diffConfigs(before, after)).toMatchObject([{ path: ['controls', 'rateSwitch', 'rates'], beforeWords: '0.5, 1', afterWords: '0.4, 1' }]);
  });
});

describe('valueWords', () => {
  it('says none for null and not set for a missing value', () => {
    expect(valueWords(null)).toBe('none');
    expect(valueWords(undefined)).toBe('not set');
  });

  it('writes degrees and percent without a space', () => {
    expect(valueWords(45, '°')).toBe('45°');
    expect(valueWords(80, '%')).toBe('80%');
  });
});
