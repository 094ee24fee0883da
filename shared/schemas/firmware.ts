import { z } from 'zod';
import type { BoardId } from './ids';
import { RobotConfigSchema } from './robot-config';

/** The body of `POST /api/robots/:robotId/preview-files`: the unsaved draft to render. */
export const PreviewFilesInputSchema = z.object({ config: RobotConfigSchema });
export type PreviewFilesInput = z.input<typeof PreviewFilesInputSchema>;

/** What a preview should highlight a file as. */
export type FirmwareFileLanguage = 'cpp' | 'json' | 'markdown' | 'text';

export interface FirmwareFile {
  /** Path inside the bundle, with forward slashes: `greenhouse_cart/greenhouse_cart.ino`. */
  path: string;
  content: string;
  /** UTF-8 bytes. */
  size: number;
  language: FirmwareFileLanguage;
}

/** The rendered bundle of a saved revision, or of a draft (`draft: true`). */
export interface FirmwareFiles {
  robotName: string;
  /** The revision number the files carry (for a draft: the number it gets when saved next). */
  revision: number;
  draft: boolean;
  /** The short configuration hash the firmware prints at boot. */
  hash: string;
  /** The robot's sketch folder, and the handheld remote's for a home-made link (else null). */
  sketchFolder: string;
  remoteFolder: string | null;
  /** The first line the firmware prints on its serial port at start. */
  bootLine: string;
  files: FirmwareFile[];
}

/** One sketch's compile check. */
export interface SketchCheck {
  folder: string;
  board: BoardId;
  /** true: compiled; false: the compiler refused it (see messages); null: no compiler here. */
  ok: boolean | null;
  flashBytes?: number;
  flashMax?: number;
  ramBytes?: number;
  ramMax?: number;
  /** Compiler messages when it failed, or why it could not be checked. */
  messages?: string;
  /** The check was stopped at its time limit (the result is not cached). */
  timedOut?: boolean;
}

export interface VerifyResult {
  /** SHA-256 of the bundle's content; equal bundles share one check. */
  hash: string;
  sketches: SketchCheck[];
}

/** One reason a configuration cannot become firmware (the 422 `firmware_blocked` answer lists them). */
export interface FirmwareBlocker {
  path: (string | number)[];
  message: string;
}
