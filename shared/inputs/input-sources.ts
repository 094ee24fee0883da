import type { InputSourceId } from '../schemas/ids';

/** What an input source's pin must be able to do. */
export type InputPinNeed = 'interrupt' | 'external-interrupt' | 'uart-rx' | 'digital-out';

export interface InputPinRole {
  id: string;
  label: string;
  need: InputPinNeed;
}

export interface InputSource {
  id: InputSourceId;
  name: string;
  /** Units of raw channel values, shown beside the calibration. */
  unit: string;
  /** Default calibration for a channel of this source. */
  defaultCalibration: { low: number; centre: number; high: number };
  maxChannels: number;
  /** Uses the board's SPI bus (its SCK, MOSI, MISO pins) besides the roles below. */
  usesSpi: boolean;
}

export const INPUT_SOURCES: Record<InputSourceId, InputSource> = {
  // Servo pulses 1000–2000 µs, centre 1500 µs (Arduino reference, Servo.writeMicroseconds).
  'rc-pwm': { id: 'rc-pwm', name: 'RC receiver, one wire per channel', unit: 'µs', defaultCalibration: { low: 1000, centre: 1500, high: 2000 }, maxChannels: 8, usesSpi: false },
  ppm: { id: 'ppm', name: 'PPM sum signal', unit: 'µs', defaultCalibration: { low: 1000, centre: 1500, high: 2000 }, maxChannels: 8, usesSpi: false },
  // SBUS counts 172–1811 for ±100 %, centre 992 (open SBUS descriptions).
  sbus: { id: 'sbus', name: 'SBUS serial receiver', unit: 'counts', defaultCalibration: { low: 172, centre: 992, high: 1811 }, maxChannels: 16, usesSpi: false },
  ibus: { id: 'ibus', name: 'iBUS serial receiver', unit: 'µs', defaultCalibration: { low: 1000, centre: 1500, high: 2000 }, maxChannels: 14, usesSpi: false },
  // The home-made link sends each stick as a 10-bit reading (0–1023), as the remote's ADC reads it.
  nrf24: { id: 'nrf24', name: 'Home-made 2.4 GHz link (nRF24L01+)', unit: 'counts', defaultCalibration: { low: 0, centre: 512, high: 1023 }, maxChannels: 8, usesSpi: true },
};

/** The pins an input source needs for the given channel numbers. */
export function inputPinRoles(source: InputSourceId, channelNumbers: number[]): InputPinRole[] {
  switch (source) {
    case 'rc-pwm':
      return channelNumbers.map((n) => ({ id: `ch${n}`, label: `Channel ${n} pulse`, need: 'interrupt' as const }));
    case 'ppm':
      return [{ id: 'ppm', label: 'PPM signal', need: 'external-interrupt' }];
    case 'sbus':
    case 'ibus':
      return [{ id: 'rx', label: 'Serial receive', need: 'uart-rx' }];
    case 'nrf24':
      return [
        { id: 'ce', label: 'Transceiver CE', need: 'digital-out' },
        { id: 'csn', label: 'Transceiver CSN', need: 'digital-out' },
      ];
  }
}
