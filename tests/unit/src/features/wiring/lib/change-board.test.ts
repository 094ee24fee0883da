import { describe, expect, it } from 'vitest';
import { boardChangeMessage, changeBoard, changeRemoteBoard } from '@/features/wiring/lib/change-board';
import { esp32Plan, unoPlan } from '../../../../../fixtures/pin-plans';
import { buildConfig, withPins } from '../../../../../fixtures/robot-config-factory';

describe('changing the board', () => {
  it('clears and unlocks only the pins the new board lacks', () => {
    const config = withPins(unoPlan(), { 'Driver 1/a.pwm': 'D9' }, true);
    const change = changeBoard(config, 'esp32-devkitc');
    expect(change.kept).toBe(0);
    expect(change.cleared.map((c) => c.pin)).toEqual(['D9', 'D8', 'D10', 'D7', 'D2', 'D13']);
    expect(change.config.wiring.drivers[0].pins['a.pwm']).toEqual({ pin: null, locked: false });
    expect(change.config.wiring.board).toBe('esp32-devkitc');
  });

  it('keeps a pin whose id the new board also has, lock and all', () => {
    const config = withPins(unoPlan(), { 'Driver 1/a.pwm': 'D9' }, true);
    const change = changeBoard(config, 'nano');
    expect(change.cleared).toEqual([]);
    expect(change.config.wiring.drivers[0].pins['a.pwm']).toEqual({ pin: 'D9', locked: true });
  });

  it('names each cleared pin with its role in the message', () => {
    const message = boardChangeMessage(changeBoard(esp32Plan(), 'uno'), 'Uno');
    expect(message).toMatch(
      /^The robot is now on the Uno\. Every role is kept; the Uno has no GPIO25 \(Driver 1 A PWM\), /,
    );
    expect(message).toContain('GPIO13 (status LED)');
    expect(message).toMatch(/so those pins were cleared\. Choose new pins, or use “Assign free pins”\.$/);
  });

  it('moves the remote to another board without touching the robot’s pins', () => {
    const config = withPins(buildConfig({ source: 'nrf24', remoteBoard: 'nano' }), {
      'remote/ce': 'D8',
      'remote/ch1': 'A7',
      'Driver 1/a.pwm': 'D9',
    });
    const change = changeRemoteBoard(config, 'uno');
    // The Uno has A0–A5 only (pins_arduino.h, standard variant), the Nano also A6 and A7.
    expect(change.cleared).toEqual([{ label: 'remote channel 1 stick (Ch 1)', pin: 'A7' }]);
    expect(change.config.controls.link.remoteBoard).toBe('uno');
    expect(change.config.wiring).toBe(config.wiring);
  });
});
