import type { BoardPin, BoardProfile } from './board-types';

// Raspberry Pi Pico (RP2040). RP2040 datasheet, PWM chapter and pico-sdk hardware/pwm.h
// (REFERENCES §4): slice = (gpio >> 1) & 7, channel = gpio & 1, so GPIO n and n + 16 share a
// slice channel and both channels of a slice share one frequency. The UART and SPI functions
// per GPIO follow the datasheet's GPIO function table (from memory): UART TX/RX on gpio % 4 = 0/1,
// UART instance ((gpio + 4) >> 3) & 1; SPI RX/CSn/SCK/TX on gpio % 4 = 0/1/2/3, instance (gpio >> 3) & 1.
// Header pins GP0–GP22 and GP26–GP28; GP25 drives the on-board LED. The core's default pins
// (Serial1 = UART0, Serial2 = UART1, SPI on 16–19, I²C on 4/5) and its 1 kHz analogWrite and
// 133 MHz clock are from memory.

const HEADER_GPIOS = [...Array.from({ length: 23 }, (_, n) => n), 26, 27, 28];

export function rp2040Slice(gpio: number): { slice: number; channel: 'A' | 'B' } {
  return { slice: (gpio >> 1) & 7, channel: (gpio & 1) === 0 ? 'A' : 'B' };
}

/** The UART function of a GPIO, if it is a TX or RX pin. */
export function rp2040Uart(gpio: number): { port: string; role: 'rx' | 'tx' } | null {
  const role = gpio % 4 === 0 ? 'tx' : gpio % 4 === 1 ? 'rx' : null;
  if (!role) return null;
  return { port: ((gpio + 4) >> 3) & 1 ? 'Serial2' : 'Serial1', role };
}

const DEFAULT_SPI: Record<number, BoardPin['spi']> = { 16: 'miso', 17: 'ss', 18: 'sck', 19: 'mosi' };

function picoPin(n: number): BoardPin {
  const uart = rp2040Uart(n);
  const entries: Partial<BoardPin> = {
    id: `GP${n}`,
    label: n === 25 ? 'LED' : `GP${n}`,
    code: String(n),
    digital: true,
    pwm: rp2040Slice(n),
    analogIn: n >= 26 && n <= 28,
    externalInterrupt: n,
    uart: uart ? [uart] : undefined,
    spi: DEFAULT_SPI[n],
    i2c: n === 4 ? 'sda' : n === 5 ? 'scl' : undefined,
    builtinLed: n === 25 || undefined,
    onHeader: n !== 25,
    pullUp: true,
  };
  return Object.fromEntries(Object.entries(entries).filter(([, v]) => v !== undefined)) as unknown as BoardPin;
}

export const RP2040_PICO: BoardProfile = {
  id: 'rp2040-pico',
  name: 'Raspberry Pi Pico',
  shortName: 'Pico',
  family: 'rp2040',
  mcu: 'RP2040',
  logicVolts: 3.3,
  fiveVoltTolerant: false,
  coreName: 'rp2040:rp2040',
  fqbn: 'rp2040:rp2040:rpipico',
  cpuHz: 133_000_000,
  defaultPwmHz: { '*': 1000 },
  timers: [],
  servoTimerOrder: [],
  pwmUnits: { kind: 'rp2040-slices', slices: 8 },
  spi: { sck: 'GP18', mosi: 'GP19', miso: 'GP16', ss: 'GP17', ssMustBeOutput: false },
  i2c: { sda: 'GP4', scl: 'GP5' },
  uarts: [
    { port: 'Serial', rx: null, tx: null, usb: true, remappable: false },
    { port: 'Serial1', rx: 'GP1', tx: 'GP0', usb: false, remappable: false },
    { port: 'Serial2', rx: 'GP5', tx: 'GP4', usb: false, remappable: false },
  ],
  pins: [...HEADER_GPIOS, 25].sort((a, b) => a - b).map(picoPin),
  // Pico datasheet: VSYS accepts 1.8–5.5 V (from memory).
  supplyInput: {
    pin: 'VSYS',
    minVolts: 1.8,
    maxVolts: 5.5,
    note: 'VSYS feeds the on-board buck-boost regulator (1.8–5.5 V)',
  },
};
