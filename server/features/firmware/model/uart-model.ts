import type { RobotConfig } from '@shared/schemas/robot-config';
import type { IssueList } from './firmware-config-error';
import type { PinRegistry } from './pin-registry';

export interface UartModel {
  port: string;
  /** The whole begin statement(s), built here from constants and macros only. */
  beginCode: string;
  /** This port is also the USB serial port (console and uploads). */
  usb: boolean;
  baud: number;
  note: string;
}

// SBUS: 100000 baud, 8 data bits, even parity, 2 stop bits, inverted; iBUS: 115200 8N1
// (open protocol descriptions, REFERENCES §5).
const SETTINGS = {
  sbus: { baud: 100000, frame: 'SERIAL_8E2', invert: true },
  ibus: { baud: 115200, frame: 'SERIAL_8N1', invert: false },
} as const;

export function uartModel(
  config: RobotConfig,
  source: 'sbus' | 'ibus',
  pins: PinRegistry,
  issues: IssueList,
): UartModel | null {
  const path = ['wiring', 'inputPins', 'rx', 'pin'];
  const entry = pins.use(
    config.wiring.inputPins.rx?.pin,
    path,
    'MW_PIN_INPUT_RX',
    `the receiver's serial output`,
    'receiver',
  );
  if (!entry) return null;
  const s = SETTINGS[source];
  const board = pins.board;
  // The serial port whose receive line is on this pin, from the board profile.
  const rxPort = entry.pin.uart?.find((u) => u.role === 'rx')?.port;
  if (board.family === 'avr') {
    const uart = board.uarts.find((u) => u.port === rxPort);
    if (!uart) {
      const choices = board.uarts
        .map((u) => u.rx)
        .filter(Boolean)
        .join(', ');
      issues.add(path, `Pin ${entry.pinLabel} is not a serial receive pin on ${board.name} (use ${choices})`);
      return null;
    }
    const inverter = s.invert
      ? `SBUS is an inverted signal: ${board.name} needs an inverter between the receiver and ${entry.pinLabel}. `
      : '';
    const usb = uart.usb
      ? `${entry.pinLabel} is also the USB serial port: disconnect the receiver from it while uploading.`
      : `The receiver uses ${uart.port}.`;
    const note = `${inverter}${usb}`;
    return {
      port: uart.port,
      beginCode: `MW_INPUT_SERIAL.begin(${s.baud}UL, ${s.frame});`,
      usb: uart.usb,
      baud: s.baud,
      note,
    };
  }
  if (board.family === 'esp32') {
    const uart = board.uarts.find((u) => !u.usb && u.remappable);
    if (!uart) return null;
    return {
      port: uart.port,
      beginCode: `MW_INPUT_SERIAL.begin(${s.baud}UL, ${s.frame}, MW_PIN_INPUT_RX, -1, ${s.invert});`,
      usb: false,
      baud: s.baud,
      note: `${uart.port} on ${entry.pinLabel}${s.invert ? ', inverted in the UART (no external inverter needed)' : ''}.`,
    };
  }
  const port = rxPort;
  if (!port) {
    const choices = board.uarts
      .map((u) => u.rx)
      .filter(Boolean)
      .join(', ');
    issues.add(path, `Pin ${entry.pinLabel} is not a UART receive pin on ${board.name} (use ${choices})`);
    return null;
  }
  const invert = s.invert ? ' MW_INPUT_SERIAL.setInvertRX(true);' : '';
  return {
    port,
    beginCode: `MW_INPUT_SERIAL.setRX(MW_PIN_INPUT_RX);${invert} MW_INPUT_SERIAL.begin(${s.baud}UL, ${s.frame});`,
    usb: false,
    baud: s.baud,
    note: `${port} on ${entry.pinLabel}${s.invert ? ', inverted in the UART (no external inverter needed)' : ''}.`,
  };
}
