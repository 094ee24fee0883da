import type { RobotConfig } from '@shared/schemas/robot-config';

/** "None" and every channel in the table, for the stick map and the switches. */
export function channelOptions(config: RobotConfig): { value: number | null; label: string }[] {
  return [
    { value: null, label: 'None' },
    ...config.controls.channels.map((c) => ({ value: c.number, label: `${c.number} · ${c.name}` })),
  ];
}
