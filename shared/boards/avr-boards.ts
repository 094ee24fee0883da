import type { AvrTimer, BoardPin, BoardProfile, PinPwm } from './board-types';

// Pin facts from the Arduino AVR core's variants/{standard,eightanaloginputs,mega}/pins_arduino.h
// (digitalPinHasPWM, digital_pin_to_timer_PGM, digitalPinToInterrupt, digitalPinToPCICR,
// PIN_SPI_*, PIN_WIRE_*, LED_BUILTIN, NUM_DIGITAL_PINS). tests/firmware/avr-pin-tables.test.ts
// compiles these tables against those headers. Timer set-up from the core's wiring.c; Servo
// and tone() timers from the Arduino reference and library sources (REFERENCES §2).

const F_CPU = 16_000_000;
/** Timers 1–5 (and 2): 8-bit phase-correct PWM, prescaler 64 (wiring.c init()): 16 MHz / 64 / 510. */
const PHASE_CORRECT_HZ = F_CPU / 64 / 510;
/** Timer 0: fast PWM, prescaler 64 (wiring.c init(), shared with millis()): 16 MHz / 64 / 256. */
const FAST_HZ = F_CPU / 64 / 256;
const PRESCALERS = [1, 8, 64, 256, 1024];
/** Timer 2 has two more steps (ATmega328P/2560 datasheets, TCCR2B clock select, from memory). */
const TIMER2_PRESCALERS = [1, 8, 32, 64, 128, 256, 1024];

function timer(id: number, bits: 8 | 16, pins: string[], libraries: AvrTimer['libraries']): AvrTimer {
  const isZero = id === 0;
  return {
    id,
    bits,
    pins,
    prescalers: id === 2 ? TIMER2_PRESCALERS : PRESCALERS,
    defaultHz: isZero ? FAST_HZ : PHASE_CORRECT_HZ,
    defaultFormula: isZero
      ? '16 MHz / 64 / 256 = 976.6 Hz (fast PWM)'
      : '16 MHz / 64 / 510 = 490.2 Hz (phase-correct PWM)',
    coreUse: isZero ? 'millis(), micros() and delay()' : null,
    libraries,
  };
}

interface PinSpec {
  id: string;
  label: string;
  code: string;
  digital?: boolean;
  pwm?: PinPwm;
  analogIn?: boolean;
  externalInterrupt?: number;
  pinChange?: boolean;
  uart?: BoardPin['uart'];
  spi?: BoardPin['spi'];
  i2c?: BoardPin['i2c'];
  usbSerial?: boolean;
  builtinLed?: boolean;
}

function pin(spec: PinSpec): BoardPin {
  const digital = spec.digital ?? true;
  return { ...spec, digital, analogIn: spec.analogIn ?? false, onHeader: true, pullUp: digital };
}

/** PWM outputs from the timer tables: pin id → timer output. */
function pwmMap(timers: AvrTimer[]): Map<string, PinPwm> {
  const map = new Map<string, PinPwm>();
  for (const t of timers) t.pins.forEach((p, i) => map.set(p, { timer: t.id, channel: (['A', 'B', 'C'] as const)[i] }));
  return map;
}

// ATmega328P boards: digital_pin_to_timer_PGM gives T0A 6, T0B 5, T1A 9, T1B 10, T2A 11, T2B 3.
const ATMEGA328P_TIMERS: AvrTimer[] = [
  timer(0, 8, ['D6', 'D5'], []),
  timer(1, 16, ['D9', 'D10'], ['Servo']),
  timer(2, 8, ['D11', 'D3'], ['tone']),
];

function atmega328pPins(analogCount: 6 | 8, labelDigital: (n: number) => string): BoardPin[] {
  const pwm = pwmMap(ATMEGA328P_TIMERS);
  const spiRoles: Record<number, BoardPin['spi']> = { 10: 'ss', 11: 'mosi', 12: 'miso', 13: 'sck' };
  const digital = Array.from({ length: 14 }, (_, n) =>
    pin({
      id: `D${n}`,
      label: labelDigital(n),
      code: String(n),
      pwm: pwm.get(`D${n}`),
      externalInterrupt: n === 2 ? 0 : n === 3 ? 1 : undefined,
      pinChange: true,
      uart: n === 0 ? [{ port: 'Serial', role: 'rx' }] : n === 1 ? [{ port: 'Serial', role: 'tx' }] : undefined,
      usbSerial: n <= 1 || undefined,
      spi: spiRoles[n],
      builtinLed: n === 13 || undefined,
    }),
  );
  // A6 and A7 exist only on the eight-input variant and are analog inputs only: the core's
  // NUM_DIGITAL_PINS stays 20 (D0–D13, A0–A5).
  const analog = Array.from({ length: analogCount }, (_, n) =>
    pin({
      id: `A${n}`,
      label: `A${n}`,
      code: `A${n}`,
      digital: n < 6,
      analogIn: true,
      pinChange: n < 6,
      i2c: n === 4 ? 'sda' : n === 5 ? 'scl' : undefined,
    }),
  );
  return [...digital, ...analog].map(clean);
}

/** Drops undefined keys so profiles print and compare cleanly. */
function clean(p: BoardPin): BoardPin {
  return Object.fromEntries(Object.entries(p).filter(([, v]) => v !== undefined)) as unknown as BoardPin;
}

const ATMEGA328P_COMMON: Omit<BoardProfile, 'id' | 'name' | 'shortName' | 'fqbn' | 'pins'> = {
  family: 'avr',
  mcu: 'ATmega328P',
  logicVolts: 5,
  fiveVoltTolerant: true,
  coreName: 'arduino:avr',
  cpuHz: F_CPU,
  defaultPwmHz: { '0': FAST_HZ, '1': PHASE_CORRECT_HZ, '2': PHASE_CORRECT_HZ },
  timers: ATMEGA328P_TIMERS,
  // Servo library on the ATmega328P: timer 1 only (REFERENCES §2, library source).
  servoTimerOrder: [1],
  pwmUnits: { kind: 'avr-timers' },
  spi: { sck: 'D13', mosi: 'D11', miso: 'D12', ss: 'D10', ssMustBeOutput: true },
  i2c: { sda: 'A4', scl: 'A5' },
  uarts: [{ port: 'Serial', rx: 'D0', tx: 'D1', usb: true, remappable: false }],
  // Arduino board pages: input voltage (recommended) 7–12 V on VIN.
  supplyInput: {
    pin: 'VIN',
    minVolts: 7,
    maxVolts: 12,
    note: 'VIN feeds the on-board 5 V regulator (recommended 7–12 V)',
  },
};

export const UNO: BoardProfile = {
  ...ATMEGA328P_COMMON,
  id: 'uno',
  name: 'Arduino Uno R3',
  shortName: 'Uno',
  fqbn: 'arduino:avr:uno',
  pins: atmega328pPins(6, (n) => (ATMEGA328P_TIMERS.some((t) => t.pins.includes(`D${n}`)) ? `~${n}` : String(n))),
};

export const NANO: BoardProfile = {
  ...ATMEGA328P_COMMON,
  id: 'nano',
  name: 'Arduino Nano (ATmega328P)',
  shortName: 'Nano',
  fqbn: 'arduino:avr:nano',
  pins: atmega328pPins(8, (n) => (n === 0 ? 'RX0' : n === 1 ? 'TX1' : `D${n}`)),
};

// ATmega2560: digital_pin_to_timer_PGM in variants/mega gives T0A 13, T0B 4, T1A 11, T1B 12,
// T2A 10, T2B 9, T3A 5, T3B 2, T3C 3, T4A 6, T4B 7, T4C 8, T5A 46, T5B 45, T5C 44.
const MEGA_TIMERS: AvrTimer[] = [
  timer(0, 8, ['D13', 'D4'], []),
  timer(1, 16, ['D11', 'D12'], ['Servo']),
  timer(2, 8, ['D10', 'D9'], ['tone']),
  timer(3, 16, ['D5', 'D2', 'D3'], ['Servo']),
  timer(4, 16, ['D6', 'D7', 'D8'], ['Servo']),
  timer(5, 16, ['D46', 'D45', 'D44'], ['Servo']),
];

function megaPins(): BoardPin[] {
  const pwm = pwmMap(MEGA_TIMERS);
  // attachInterrupt numbers (variants/mega digitalPinToInterrupt): 2→0, 3→1, 18→5, 19→4, 20→3, 21→2.
  const interrupts: Record<number, number> = { 2: 0, 3: 1, 18: 5, 19: 4, 20: 3, 21: 2 };
  const uarts: Record<number, BoardPin['uart']> = {
    0: [{ port: 'Serial', role: 'rx' }],
    1: [{ port: 'Serial', role: 'tx' }],
    14: [{ port: 'Serial3', role: 'tx' }],
    15: [{ port: 'Serial3', role: 'rx' }],
    16: [{ port: 'Serial2', role: 'tx' }],
    17: [{ port: 'Serial2', role: 'rx' }],
    18: [{ port: 'Serial1', role: 'tx' }],
    19: [{ port: 'Serial1', role: 'rx' }],
  };
  const spiRoles: Record<number, BoardPin['spi']> = { 50: 'miso', 51: 'mosi', 52: 'sck', 53: 'ss' };
  // Pin-change pins the core's digitalPinToPCICR knows: 10–13, 50–53 and A8–A15.
  const pinChange = (n: number) => (n >= 10 && n <= 13) || (n >= 50 && n <= 53);
  const digital = Array.from({ length: 54 }, (_, n) =>
    pin({
      id: `D${n}`,
      label: String(n),
      code: String(n),
      pwm: pwm.get(`D${n}`),
      externalInterrupt: interrupts[n],
      pinChange: pinChange(n) || undefined,
      uart: uarts[n],
      usbSerial: n <= 1 || undefined,
      spi: spiRoles[n],
      i2c: n === 20 ? 'sda' : n === 21 ? 'scl' : undefined,
      builtinLed: n === 13 || undefined,
    }),
  );
  const analog = Array.from({ length: 16 }, (_, n) =>
    pin({ id: `A${n}`, label: `A${n}`, code: `A${n}`, analogIn: true, pinChange: n >= 8 || undefined }),
  );
  return [...digital, ...analog].map(clean);
}

export const MEGA2560: BoardProfile = {
  id: 'mega2560',
  name: 'Arduino Mega 2560',
  shortName: 'Mega',
  family: 'avr',
  mcu: 'ATmega2560',
  logicVolts: 5,
  fiveVoltTolerant: true,
  coreName: 'arduino:avr',
  fqbn: 'arduino:avr:mega',
  cpuHz: F_CPU,
  defaultPwmHz: Object.fromEntries(MEGA_TIMERS.map((t) => [String(t.id), t.defaultHz])),
  timers: MEGA_TIMERS,
  // The Servo library source takes timers 5, 1, 3, 4 in that order, 12 servos each (REFERENCES §2).
  servoTimerOrder: [5, 1, 3, 4],
  pwmUnits: { kind: 'avr-timers' },
  spi: { sck: 'D52', mosi: 'D51', miso: 'D50', ss: 'D53', ssMustBeOutput: true },
  i2c: { sda: 'D20', scl: 'D21' },
  uarts: [
    { port: 'Serial', rx: 'D0', tx: 'D1', usb: true, remappable: false },
    { port: 'Serial1', rx: 'D19', tx: 'D18', usb: false, remappable: false },
    { port: 'Serial2', rx: 'D17', tx: 'D16', usb: false, remappable: false },
    { port: 'Serial3', rx: 'D15', tx: 'D14', usb: false, remappable: false },
  ],
  pins: megaPins(),
  supplyInput: {
    pin: 'VIN',
    minVolts: 7,
    maxVolts: 12,
    note: 'VIN feeds the on-board 5 V regulator (recommended 7–12 V)',
  },
};
