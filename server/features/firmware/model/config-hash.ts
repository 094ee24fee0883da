import { createHash } from 'node:crypto';
import type { RobotConfig } from '@shared/schemas/robot-config';

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

/** The short content hash the firmware prints at boot: the first 8 hex digits of SHA-256. */
export function configHash(config: RobotConfig): string {
  return createHash('sha256').update(canonicalJson(config)).digest('hex').slice(0, 8);
}
