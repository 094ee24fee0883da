import { defaultPwmHz } from '@shared/boards/boards';
import type { BoardPin, BoardProfile } from '@shared/boards/board-types';
import { formatHz } from '@shared/boards/pwm-timing';

/** How a pin makes PWM, in a few words: "timer 1 A", "LEDC channel", "slice 4 B". */
export function pwmWords(board: BoardProfile, pin: BoardPin): string | null {
  const pwm = pin.pwm;
  if (!pwm) return null;
  if ('timer' in pwm) return `timer ${pwm.timer} ${pwm.channel}`;
  if ('slice' in pwm) return `slice ${pwm.slice} ${pwm.channel}`;
  return board.pwmUnits.kind === 'ledc' ? 'LEDC channel' : 'PWM';
}

export type AbilityTone = 'plain' | 'caution' | 'never';

export interface AbilityTag {
  /** Short text on the tag. */
  text: string;
  /** The full sentence, for the tooltip and screen readers. */
  title: string;
  tone: AbilityTone;
}

function pwmTag(board: BoardProfile, pin: BoardPin): AbilityTag | null {
  const pwm = pin.pwm;
  if (!pwm) return null;
  const hz = defaultPwmHz(board, pin);
  const at = hz ? `, ${formatHz(hz)} by default` : '';
  if ('timer' in pwm)
    return {
      text: `PWM T${pwm.timer}${pwm.channel}`,
      title: `PWM on timer ${pwm.timer}, output ${pwm.channel}${at}`,
      tone: 'plain',
    };
  if ('slice' in pwm)
    return {
      text: `PWM ${pwm.slice}${pwm.channel}`,
      title: `PWM on slice ${pwm.slice}, channel ${pwm.channel}${at}; GPIO n and n + 16 share a channel`,
      tone: 'plain',
    };
  return { text: 'PWM', title: `PWM through any of the LEDC channels${at}`, tone: 'plain' };
}

/** Every ability and caution of a pin as short tags, most useful first. */
export function abilityTags(board: BoardProfile, pin: BoardPin): AbilityTag[] {
  const tags: (AbilityTag | null)[] = [
    pin.flash ? { text: 'flash', title: 'Wired to the module’s flash memory: never usable', tone: 'never' } : null,
    !pin.onHeader
      ? { text: 'not on header', title: 'Exists on the chip but has no header pin', tone: 'caution' }
      : null,
    pwmTag(board, pin),
    pin.analogIn
      ? {
          text: pin.digital ? 'analog in' : 'analog only',
          title: pin.digital ? 'Analog input (analogRead)' : 'Analog input only: no digital read or write',
          tone: pin.digital ? 'plain' : 'caution',
        }
      : null,
    board.family === 'avr' && pin.externalInterrupt !== undefined
      ? {
          text: `INT ${pin.externalInterrupt}`,
          title: `External interrupt ${pin.externalInterrupt} (attachInterrupt)`,
          tone: 'plain',
        }
      : null,
    board.family === 'avr' && pin.pinChange
      ? { text: 'pin-change', title: 'Pin-change interrupt', tone: 'plain' }
      : null,
    ...(pin.uart ?? []).map((u): AbilityTag => ({
      text: `${u.port} ${u.role.toUpperCase()}`,
      title: `${u.port} ${u.role === 'rx' ? 'receive' : 'transmit'}`,
      tone: 'plain',
    })),
    pin.spi
      ? {
          text: `SPI ${pin.spi.toUpperCase()}`,
          title: `SPI bus ${pin.spi.toUpperCase()}${pin.spi === 'ss' && board.spi.ssMustBeOutput ? ': must stay an output while the board is SPI master' : ''}`,
          tone: 'plain',
        }
      : null,
    pin.i2c ? { text: `I²C ${pin.i2c.toUpperCase()}`, title: `I²C bus ${pin.i2c.toUpperCase()}`, tone: 'plain' } : null,
    pin.usbSerial
      ? {
          text: 'USB serial',
          title: 'Carries the USB serial port used for uploads and the serial monitor',
          tone: 'caution',
        }
      : null,
    pin.inputOnly
      ? { text: 'input only', title: 'Input only: no output and no pull resistors', tone: 'caution' }
      : null,
    pin.strapping
      ? {
          text: 'strapping',
          title: 'Read at reset to choose the boot mode: the wrong level stops the board starting',
          tone: 'caution',
        }
      : null,
    pin.builtinLed ? { text: 'built-in LED', title: 'Drives the LED on the board', tone: 'plain' } : null,
  ];
  return tags.filter((t): t is AbilityTag => t !== null);
}

/** "D9" or, when the silkscreen says more than the id and the code, "D9 (~9)", "GPIO36 (VP)". */
export function pinName(pin: BoardPin): string {
  return pin.label === pin.id || pin.label === pin.code ? pin.id : `${pin.id} (${pin.label})`;
}
