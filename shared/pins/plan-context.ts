import { getBoard, servoTimers } from '../boards/boards';
import type { BoardPin, BoardProfile } from '../boards/board-types';
import { INPUT_SOURCES } from '../inputs/input-sources';
import type { RobotConfig } from '../schemas/robot-config';
import { collectDemands, type PinDemand, type PlanSide } from './pin-demands';

/** What the check and the assignment know about one board's pin plan. */
export interface PlanContext {
  config: RobotConfig;
  side: PlanSide;
  board: BoardProfile;
  demands: PinDemand[];
  /** The SPI bus is in use (the transceiver), so SCK, MOSI and MISO are taken. */
  spiInUse: boolean;
  /** The firmware prints diagnostics on the USB serial port, so its pins are taken. */
  usbSerialInUse: boolean;
  /** AVR timers the servo pulses take (Servo library order). */
  servoTimerIds: number[];
}

export function planContexts(config: RobotConfig, demands: PinDemand[] = collectDemands(config)): PlanContext[] {
  const robotDemands = demands.filter((d) => d.side === 'robot');
  const servoCount = robotDemands.filter((d) => d.need === 'servo-pulse').length;
  const board = getBoard(config.wiring.board);
  const contexts: PlanContext[] = [
    {
      config,
      side: 'robot',
      board,
      demands: robotDemands,
      spiInUse: INPUT_SOURCES[config.controls.source].usesSpi,
      usbSerialInUse: config.firmware.serialDiagnostics,
      servoTimerIds: servoTimers(board, servoCount),
    },
  ];
  const remote = demands.filter((d) => d.side === 'remote');
  if (remote.length > 0) {
    contexts.push({
      config,
      side: 'remote',
      board: getBoard(config.controls.link.remoteBoard),
      demands: remote,
      spiInUse: true,
      usbSerialInUse: config.firmware.serialDiagnostics,
      servoTimerIds: [],
    });
  }
  return contexts;
}

/** The side's board in sentences: "the Uno", "the remote's Nano". */
export function boardWords(ctx: Pick<PlanContext, 'side' | 'board'>): string {
  return ctx.side === 'remote' ? `the remote’s ${ctx.board.shortName}` : `the ${ctx.board.shortName}`;
}

/** Taken by a bus in use: the SPI data and clock lines, or the USB serial pins. */
export function busReason(
  ctx: PlanContext,
  pin: BoardPin,
): { code: 'pin-on-spi-bus' | 'pin-on-usb-serial'; reason: string } | null {
  if (ctx.spiInUse && pin.spi && pin.spi !== 'ss') {
    return {
      code: 'pin-on-spi-bus',
      reason: `is the SPI bus ${pin.spi.toUpperCase()} line, which the transceiver uses`,
    };
  }
  if (ctx.usbSerialInUse && pin.usbSerial) {
    return { code: 'pin-on-usb-serial', reason: 'carries the USB serial port, which the firmware’s diagnostics use' };
  }
  return null;
}

export function capitalize(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

export function listWords(items: string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
