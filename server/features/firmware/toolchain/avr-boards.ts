import type { BoardId } from '@shared/schemas/ids';

/** What the compiler needs to build for one AVR board. */
export interface AvrBuildTarget {
  board: BoardId;
  mcu: string;
  /** Folder under the core's `variants/`. */
  variant: string;
  /** `ARDUINO_<build.board>` define. */
  boardDefine: string;
  /** Bytes of flash a sketch may use (the bootloader takes the rest). */
  flashMax: number;
  /** Bytes of RAM. */
  ramMax: number;
}

// Values from the Arduino AVR core's boards.txt (version 1.8.7 as packaged by Debian):
// uno.build.mcu / .variant / .board, uno.upload.maximum_size = 32256, maximum_data_size = 2048;
// nano.menu.cpu.atmega328 (the current bootloader): maximum_size = 30720, 2048;
// mega.menu.cpu.atmega2560: maximum_size = 253952; the ATmega2560 has 8192 bytes of SRAM
// (ATmega2560 datasheet, memory overview).
export const AVR_TARGETS: Partial<Record<BoardId, AvrBuildTarget>> = {
  uno: {
    board: 'uno',
    mcu: 'atmega328p',
    variant: 'standard',
    boardDefine: 'ARDUINO_AVR_UNO',
    flashMax: 32256,
    ramMax: 2048,
  },
  nano: {
    board: 'nano',
    mcu: 'atmega328p',
    variant: 'eightanaloginputs',
    boardDefine: 'ARDUINO_AVR_NANO',
    flashMax: 30720,
    ramMax: 2048,
  },
  mega2560: {
    board: 'mega2560',
    mcu: 'atmega2560',
    variant: 'mega',
    boardDefine: 'ARDUINO_AVR_MEGA2560',
    flashMax: 253952,
    ramMax: 8192,
  },
};

export function avrTarget(board: BoardId): AvrBuildTarget {
  const target = AVR_TARGETS[board];
  if (!target) throw new Error(`Board "${board}" is not an AVR board`);
  return target;
}

/** The `ARDUINO` define: the IDE version the core expects (1.8.19). */
export const ARDUINO_IDE_VERSION = '10819';
export const F_CPU = '16000000L';
