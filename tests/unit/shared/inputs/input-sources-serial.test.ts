import { describe, expect, it } from 'vitest';
import { INPUT_SOURCES, remotePinRoles } from '@shared/inputs/input-sources';
import { buildConfig } from '../../../fixtures/robot-config-factory';

describe('serial receivers (REFERENCES §5)', () => {
  it('reads SBUS at 100000 baud, 8E2, inverted, and needs an inverter on ATmega boards only', () => {
    expect(INPUT_SOURCES.sbus.serial).toEqual({ baud: 100_000, format: '8E2', inverted: true });
    expect(INPUT_SOURCES.sbus.needsPart?.families).toEqual(['avr']);
  });

  it('reads iBUS at 115200 baud, not inverted', () => {
    expect(INPUT_SOURCES.ibus.serial).toEqual({ baud: 115_200, format: '8N1', inverted: false });
    expect(INPUT_SOURCES.ibus.needsPart).toBeUndefined();
  });
});

describe('the handheld remote’s pins', () => {
  it('reads sticks on analog inputs and the rate and arming switches as switches', () => {
    const config = buildConfig({ source: 'nrf24', channels: 3, switches: true });
    expect(remotePinRoles(config.controls).map((r) => [r.id, r.need])).toEqual([
      ['ce', 'digital-out'],
      ['csn', 'digital-out'],
      ['ch1', 'analog-in'],
      ['ch2', 'analog-in'],
      ['ch3', 'analog-in'],
      ['ch4', 'switch-in'],
      ['ch5', 'switch-in'],
    ]);
  });
});
