import type { InputSourceId } from '../schemas/ids';
import type { Controls } from '../schemas/robot-config';

/**
 * What an input source's pin must be able to do. `analog-in` and `switch-in` are the
 * handheld remote's stick and switch inputs (home-made link only).
 */
export type InputPinNeed = 'interrupt' | 'external-interrupt' | 'uart-rx' | 'digital-out' | 'analog-in' | 'switch-in';

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
  /** Serial receivers: line settings, and whether the signal is inverted. */
  serial?: { baud: number; format: string; inverted: boolean };
  /** Board families that need extra parts to read this source, with the reason. */
  needsPart?: { families: ('avr' | 'esp32' | 'rp2040')[]; part: string; reason: string };
}

export const INPUT_SOURCES: Record<InputSourceId, InputSource> = {
  // Servo pulses 1000–2000 µs, centre 1500 µs (Arduino reference, Servo.writeMicroseconds).
  'rc-pwm': {
    id: 'rc-pwm',
    name: 'RC receiver, one wire per channel',
    unit: 'µs',
    defaultCalibration: { low: 1000, centre: 1500, high: 2000 },
    maxChannels: 8,
    usesSpi: false,
  },
  ppm: {
    id: 'ppm',
    name: 'PPM sum signal',
    unit: 'µs',
    defaultCalibration: { low: 1000, centre: 1500, high: 2000 },
    maxChannels: 8,
    usesSpi: false,
  },
  // SBUS counts 172–1811 for ±100 %, centre 992 (open SBUS descriptions).
  // SBUS: 100000 baud, 8E2, inverted (REFERENCES §5). ATmega UARTs cannot invert their input;
  // the ESP32 UART and the RP2040 GPIO input can (ESP32 TRM UART chapter, RP2040 datasheet
  // IO_BANK0 INOVER; from memory).
  sbus: {
    id: 'sbus',
    name: 'SBUS serial receiver',
    unit: 'counts',
    defaultCalibration: { low: 172, centre: 992, high: 1811 },
    maxChannels: 16,
    usesSpi: false,
    serial: { baud: 100_000, format: '8E2', inverted: true },
    needsPart: {
      families: ['avr'],
      part: 'a signal inverter (one NPN transistor and two resistors, or a 74HC14 gate)',
      reason: 'SBUS is sent inverted and the ATmega serial port cannot invert its input',
    },
  },
  // iBUS: 115200 baud, not inverted (REFERENCES §5).
  ibus: {
    id: 'ibus',
    name: 'iBUS serial receiver',
    unit: 'µs',
    defaultCalibration: { low: 1000, centre: 1500, high: 2000 },
    maxChannels: 14,
    usesSpi: false,
    serial: { baud: 115_200, format: '8N1', inverted: false },
  },
  // The home-made link sends each stick as a 10-bit reading (0–1023), as the remote's ADC reads it.
  nrf24: {
    id: 'nrf24',
    name: 'Home-made 2.4 GHz link (nRF24L01+)',
    unit: 'counts',
    defaultCalibration: { low: 0, centre: 512, high: 1023 },
    maxChannels: 8,
    usesSpi: true,
  },
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

/**
 * The handheld remote's pins for the home-made link: the transceiver's CE and CSN (plus the
 * SPI bus), one analog input per stick channel and a switch input per switch channel. A channel
 * used by the rate or arming switch reads a switch to ground; every other channel reads a
 * potentiometer or stick axis.
 */
export function remotePinRoles(controls: Pick<Controls, 'channels' | 'rateSwitch' | 'armingSwitch'>): InputPinRole[] {
  const switches = new Set(
    [controls.rateSwitch.channel, controls.armingSwitch.channel].filter((c): c is number => c !== null),
  );
  const channels = [...controls.channels].sort((a, b) => a.number - b.number);
  return [
    { id: 'ce', label: 'Transceiver CE', need: 'digital-out' },
    { id: 'csn', label: 'Transceiver CSN', need: 'digital-out' },
    ...channels.map((c): InputPinRole =>
      switches.has(c.number)
        ? { id: `ch${c.number}`, label: `Channel ${c.number} switch (${c.name})`, need: 'switch-in' }
        : { id: `ch${c.number}`, label: `Channel ${c.number} stick (${c.name})`, need: 'analog-in' },
    ),
  ];
}
