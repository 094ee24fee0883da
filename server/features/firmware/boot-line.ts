import type { RobotConfig } from '@shared/schemas/robot-config';
import { FIRMWARE_GENERATOR_VERSION } from './generator-version';
import { configHash } from './model/config-hash';

/**
 * The line the generated firmware prints on its serial port at start and for "about"
 * (templates/common/mw_console.h.hbs, mw_print_boot), so the app can show which line to look
 * for on a robot to know which revision it runs.
 */
export function bootLine(config: RobotConfig, revision: number): string {
  return (
    `boot robot="${config.name}" revision=${revision} hash=${configHash(config)} ` +
    `generator=${FIRMWARE_GENERATOR_VERSION} board=${config.wiring.board} input=${config.controls.source}`
  );
}
