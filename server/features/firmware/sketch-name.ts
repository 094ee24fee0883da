import { snakeWords } from './c-text';

// Arduino sketch specification (sketch folder and main file): the name starts with a
// letter or digit, continues with letters, digits, underscores, dots and dashes, is at
// most 63 characters, and the main file is <folder>/<folder>.ino.
export const SKETCH_NAME_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_.-]{0,62}$/;
const MAX_LENGTH = 63;
const REMOTE_SUFFIX = '_remote';

/** The robot's sketch folder name: the configured one, or one made from the robot's name. */
export function sketchFolderName(robotName: string, configured: string | null): string {
  if (configured !== null) {
    if (!SKETCH_NAME_PATTERN.test(configured))
      throw new Error(`firmware.sketchName "${configured}" is not a valid sketch name`);
    return configured;
  }
  const words = snakeWords(robotName);
  return words.slice(0, MAX_LENGTH).replace(/_+$/, '') || 'mixwright_robot';
}

/** The handheld remote's sketch folder, beside the robot's, within the length limit. */
export function remoteFolderName(robotFolder: string): string {
  return `${robotFolder.slice(0, MAX_LENGTH - REMOTE_SUFFIX.length)}${REMOTE_SUFFIX}`;
}
