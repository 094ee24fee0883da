import { CONFIG_HASH_LENGTH, configHash } from '../history/config-hash';
import type { RobotConfig } from '../schemas/robot-config';

/**
 * The line generated firmware prints at start-up, and the remote's equivalent:
 *   boot robot="Greenhouse Cart" revision=3 hash=1a2b3c4d generator=0.1.0 board=nano input=ppm
 *   remote for robot="Greenhouse Cart" revision=3 hash=1a2b3c4d generator=0.1.0
 * A serial monitor may put a time stamp in front, and people paste several lines; the first
 * line holding `robot="` is the one read.
 */
export interface BootLine {
  device: 'robot' | 'remote';
  robotName: string;
  revision: number;
  hash: string;
  /** The other key=value pairs (generator, board, input), as printed. */
  extra: Record<string, string>;
}

export type BootLineResult = { ok: true; line: BootLine } | { ok: false; reason: string };

const START = /(boot|remote for) robot="/;

function pairs(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const match of text.matchAll(/([a-z]+)=(\S+)/g)) out[match[1]] ??= match[2];
  return out;
}

/** Reads a pasted boot line; the reason says what is missing when it cannot. */
export function parseBootLine(pasted: string): BootLineResult {
  const line = pasted.split(/\r?\n/).find((l) => START.test(l));
  if (!line) {
    return {
      ok: false,
      reason: 'No boot line found: paste the line the robot prints at start-up, beginning with boot robot="',
    };
  }
  const start = START.exec(line)!;
  const rest = line.slice(start.index + start[0].length);
  // The name may itself hold quotes; it ends at the last `" revision=`.
  const end = rest.lastIndexOf('" revision=');
  if (end < 0) return { ok: false, reason: 'The boot line has no revision=… after the robot name' };
  const fields = pairs(rest.slice(end + 1));
  const revision = Number(fields.revision);
  if (!/^\d+$/.test(fields.revision ?? '') || !Number.isSafeInteger(revision)) {
    return { ok: false, reason: `The boot line's revision "${fields.revision ?? ''}" is not a whole number` };
  }
  const hash = (fields.hash ?? '').toLowerCase();
  if (!new RegExp(`^[0-9a-f]{${CONFIG_HASH_LENGTH}}$`).test(hash)) {
    return {
      ok: false,
      reason: `The boot line's hash must be ${CONFIG_HASH_LENGTH} hexadecimal digits, got "${fields.hash ?? ''}"`,
    };
  }
  const { revision: _r, hash: _h, ...extra } = fields;
  return {
    ok: true,
    line: { device: start[1] === 'boot' ? 'robot' : 'remote', robotName: rest.slice(0, end), revision, hash, extra },
  };
}

/**
 * The line the generated firmware prints on its serial port at start and for "about"
 * (templates/common/mw_console.h.hbs, mw_print_boot), so the app can show which line to look
 * for on a robot to know which revision it runs. `generator` is the firmware generator's version.
 */
export function formatBootLine(config: RobotConfig, revision: number, generator: string): string {
  return (
    `boot robot="${config.name}" revision=${revision} hash=${configHash(config)} ` +
    `generator=${generator} board=${config.wiring.board} input=${config.controls.source}`
  );
}
