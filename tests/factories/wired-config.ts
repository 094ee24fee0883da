import { assignPins } from '@shared/pins/assign-pins';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { buildStarterConfig, type StarterOptions } from '@shared/starter';

/** A starter configuration with every pin placed by the pin plan: one that becomes firmware. */
export function wiredConfig(options: Partial<StarterOptions> = {}): RobotConfig {
  const starter = buildStarterConfig({ layout: 'trio-omni', name: 'Greenhouse Cart', ...options });
  const placed = assignPins(starter);
  if (!placed.ok) throw new Error(`The pin plan could not place every pin: ${placed.reason}`);
  return placed.config;
}
