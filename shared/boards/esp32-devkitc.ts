import type { BoardPin, BoardProfile } from './board-types';

// ESP32-WROOM-32 on a DevKitC-style board. Facts from Espressif's ESP-IDF v5 "GPIO & RTC GPIO"
// and "LED Control (LEDC)" pages and the ESP32 Technical Reference Manual (REFERENCES §3):
// strapping pins 0, 2, 5, 12, 15; GPIO 6–11 wired to the SPI flash; GPIO 34–39 input only,
// without pull resistors; UART0 (TX 1, RX 3) is the USB serial port; 16 LEDC channels.
// Header labels and the core's default pins (Serial2 on 16/17, SPI on 18/19/23/5, I²C on
// 21/22, analogWrite at 1 kHz) are from memory of the board and of the Arduino ESP32 core.

const HEADER_GPIOS = [
  0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17, 18, 19, 21, 22, 23, 25, 26, 27, 32, 33, 34, 35, 36, 39,
];
const STRAPPING = new Set([0, 2, 5, 12, 15]);
const FLASH = new Set([6, 7, 8, 9, 10, 11]);
/** ADC1 (32–39) and ADC2 (0, 2, 4, 12–15, 25–27; unusable while Wi-Fi runs). */
const ANALOG = new Set([0, 2, 4, 12, 13, 14, 15, 25, 26, 27, 32, 33, 34, 35, 36, 39]);
const LABELS: Record<number, string> = {
  1: 'TX',
  3: 'RX',
  6: 'CLK',
  7: 'SD0',
  8: 'SD1',
  9: 'SD2',
  10: 'SD3',
  11: 'CMD',
  36: 'VP',
  39: 'VN',
};
const SPI: Record<number, BoardPin['spi']> = { 18: 'sck', 19: 'miso', 23: 'mosi', 5: 'ss' };
const UART: Record<number, BoardPin['uart']> = {
  1: [{ port: 'Serial', role: 'tx' }],
  3: [{ port: 'Serial', role: 'rx' }],
  16: [{ port: 'Serial2', role: 'rx' }],
  17: [{ port: 'Serial2', role: 'tx' }],
};

export function isEsp32InputOnly(gpio: number): boolean {
  return gpio >= 34 && gpio <= 39;
}

function esp32Pin(n: number): BoardPin {
  const inputOnly = isEsp32InputOnly(n);
  const flash = FLASH.has(n);
  const entries: Partial<BoardPin> = {
    id: `GPIO${n}`,
    label: LABELS[n] ?? `IO${n}`,
    code: String(n),
    digital: !flash,
    pwm: inputOnly || flash ? undefined : { ledc: true },
    analogIn: ANALOG.has(n),
    // attachInterrupt() works on every GPIO; the number is the GPIO itself.
    externalInterrupt: flash ? undefined : n,
    uart: UART[n],
    spi: SPI[n],
    i2c: n === 21 ? 'sda' : n === 22 ? 'scl' : undefined,
    inputOnly: inputOnly || undefined,
    strapping: STRAPPING.has(n) || undefined,
    flash: flash || undefined,
    usbSerial: n === 1 || n === 3 || undefined,
    onHeader: true,
    pullUp: !inputOnly && !flash,
  };
  return Object.fromEntries(Object.entries(entries).filter(([, v]) => v !== undefined)) as unknown as BoardPin;
}

export const ESP32_DEVKITC: BoardProfile = {
  id: 'esp32-devkitc',
  name: 'ESP32-WROOM-32 DevKitC',
  shortName: 'ESP32 DevKitC',
  family: 'esp32',
  mcu: 'ESP32 (ESP32-WROOM-32)',
  logicVolts: 3.3,
  fiveVoltTolerant: false,
  coreName: 'esp32:esp32',
  fqbn: 'esp32:esp32:esp32',
  cpuHz: 240_000_000,
  defaultPwmHz: { '*': 1000 },
  timers: [],
  servoTimerOrder: [],
  // 16 channels, 8 timers (4 per speed mode), 80 MHz APB clock, up to 20-bit duty (REFERENCES §3).
  pwmUnits: { kind: 'ledc', channels: 16, timers: 8, clockHz: 80_000_000, maxBits: 20 },
  spi: { sck: 'GPIO18', mosi: 'GPIO23', miso: 'GPIO19', ss: 'GPIO5', ssMustBeOutput: false },
  i2c: { sda: 'GPIO21', scl: 'GPIO22' },
  uarts: [
    { port: 'Serial', rx: 'GPIO3', tx: 'GPIO1', usb: true, remappable: false },
    { port: 'Serial2', rx: 'GPIO16', tx: 'GPIO17', usb: false, remappable: true },
  ],
  pins: HEADER_GPIOS.map(esp32Pin),
  // The 5V pin's role and the ±5 % window are from memory.
  supplyInput: {
    pin: '5V',
    minVolts: 4.75,
    maxVolts: 5.25,
    note: 'the 5V pin feeds the 3.3 V regulator and expects a regulated 5 V',
  },
};
