import type { BoardId } from '../schemas/ids';

/** How a pin makes PWM: an AVR timer output, any ESP32 LEDC channel, or an RP2040 slice channel. */
export type PinPwm =
  { timer: number; channel: 'A' | 'B' | 'C' } | { ledc: true } | { slice: number; channel: 'A' | 'B' };

export interface PinUart {
  /** The Arduino object that owns the port: 'Serial', 'Serial1'… */
  port: string;
  role: 'rx' | 'tx';
}

export interface BoardPin {
  /** The id Mixwright stores: the label on the board, e.g. 'D9', 'A0', 'GPIO25', 'GP15'. */
  id: string;
  /** The label as printed beside the pin (silkscreen), for the wiring sheet. */
  label: string;
  /** What generated code writes for this pin: '9', 'A0', '25'. */
  code: string;
  /** Usable with digitalRead/digitalWrite. */
  digital: boolean;
  pwm?: PinPwm;
  analogIn: boolean;
  /** attachInterrupt() number (AVR), or the GPIO number where every pin has one. */
  externalInterrupt?: number;
  /** Has a pin-change interrupt (AVR) the firmware can use for pulse timing. */
  pinChange?: boolean;
  uart?: PinUart[];
  spi?: 'sck' | 'mosi' | 'miso' | 'ss';
  i2c?: 'sda' | 'scl';
  /** Input only: no output driver, no pull resistors (ESP32 GPIO 34–39). */
  inputOnly?: boolean;
  /** Read at reset to choose the boot mode (ESP32); a wrong level stops the board booting. */
  strapping?: boolean;
  /** Wired to the module's SPI flash: never usable. */
  flash?: boolean;
  /** Carries the USB serial port (the one the Serial Monitor and uploads use). */
  usbSerial?: boolean;
  builtinLed?: boolean;
  /** False for a pin that exists on the chip but not on the board's header (the Pico's LED pin). */
  onHeader: boolean;
  /** Has an internal pull-up the firmware can switch on (for a switch to ground). */
  pullUp: boolean;
}

/** An AVR hardware timer, as the Arduino AVR core sets it up. */
export interface AvrTimer {
  id: number;
  bits: 8 | 16;
  /** Pin ids on this timer's outputs, in channel order. */
  pins: string[];
  /** Clock prescalers the timer offers (datasheet, timer/counter chapters). */
  prescalers: number[];
  /** Frequency the core leaves the timer at, in Hz. */
  defaultHz: number;
  /** How defaultHz comes about, for the advice text. */
  defaultFormula: string;
  /** What the core itself runs on it (timer 0: millis(), micros(), delay()). */
  coreUse: string | null;
  /** Libraries Mixwright may use that take this timer over. */
  libraries: ('Servo' | 'tone')[];
}

export interface BoardUart {
  port: string;
  rx: string | null;
  tx: string | null;
  /** This port is the USB serial link (uploads and the Serial Monitor). */
  usb: boolean;
  /** Its pins can be moved to any GPIO through the pin matrix (ESP32). */
  remappable: boolean;
}

export interface BoardSpi {
  sck: string;
  mosi: string;
  miso: string;
  ss: string;
  /** The AVR hardware falls back to SPI slave when SS is an input reading low: SS must stay an output. */
  ssMustBeOutput: boolean;
}

export interface BoardProfile {
  id: BoardId;
  name: string;
  /** Short name for sentences: "the Uno has 6 PWM pins". */
  shortName: string;
  family: 'avr' | 'esp32' | 'rp2040';
  mcu: string;
  /** Logic high level of the pins, in volts. */
  logicVolts: number;
  /** Whether the pins accept 5 V signals. */
  fiveVoltTolerant: boolean;
  /** The Arduino core the firmware bundle targets (platform id) and the board's fully qualified name. */
  coreName: string;
  fqbn: string;
  cpuHz: number;
  /** analogWrite()'s frequency per timer id (AVR) or for every pin ('*'). */
  defaultPwmHz: Record<string, number>;
  /** AVR timers; empty on boards where PWM is not tied to shared timers. */
  timers: AvrTimer[];
  /** The order in which the Servo library takes timers, 12 servos per timer (AVR). */
  servoTimerOrder: number[];
  /** PWM hardware limits outside AVR: ESP32 LEDC channels, RP2040 slices. */
  pwmUnits:
    | { kind: 'avr-timers' }
    | { kind: 'ledc'; channels: number; timers: number; clockHz: number; maxBits: number }
    | { kind: 'rp2040-slices'; slices: number };
  spi: BoardSpi;
  i2c: { sda: string; scl: string };
  uarts: BoardUart[];
  pins: BoardPin[];
  /** Supply input that may take a battery directly, with its range in volts. */
  supplyInput: { pin: string; minVolts: number; maxVolts: number; note: string };
}
