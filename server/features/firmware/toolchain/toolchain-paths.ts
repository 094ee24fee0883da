import { fileURLToPath } from 'node:url';

export interface ToolchainOptions {
  /** The Arduino AVR core (`hardware/arduino/avr`). */
  coreRoot?: string;
  /** Where built cores and temporary build folders go (git-ignored). */
  cacheRoot?: string;
}

/** Debian's `arduino-core-avr` package puts the core here. */
export const DEFAULT_AVR_CORE_ROOT = '/usr/share/arduino/hardware/arduino/avr';
export const REPO_ROOT = fileURLToPath(new URL('../../../../', import.meta.url));
export const DEFAULT_CACHE_ROOT = fileURLToPath(new URL('../../../../.cache/firmware/', import.meta.url));

export function toolchainPaths(options: ToolchainOptions = {}): Required<ToolchainOptions> {
  return {
    coreRoot: options.coreRoot ?? DEFAULT_AVR_CORE_ROOT,
    cacheRoot: options.cacheRoot ?? DEFAULT_CACHE_ROOT,
  };
}
