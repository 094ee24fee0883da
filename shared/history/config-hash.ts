import type { RobotConfig } from '../schemas/robot-config';
import { sha256Hex } from './sha256';

/** JSON with object keys sorted at every level, so equal configurations hash equally. */
export function canonicalJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonicalJson(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

/** Length of the hash the firmware prints at boot: 8 hex digits, 32 bits. */
export const CONFIG_HASH_LENGTH = 8;

/**
 * The short content hash the firmware prints at boot and the bundle's README names: the first
 * 8 hex digits of SHA-256 over the canonical JSON of the configuration. The firmware generator
 * and the boot-line lookup both use this one function.
 */
export function configHash(config: RobotConfig | unknown): string {
  return sha256Hex(canonicalJson(config)).slice(0, CONFIG_HASH_LENGTH);
}
