import { BOARDS } from '@shared/boards/boards';
import { LAYOUT_LABELS } from '@shared/kinematics/presets';
import type { BoardId, ChassisLayout } from '@shared/schemas/ids';
import type { RobotListItem } from '@shared/schemas/robots';

export function layoutLabel(layout: ChassisLayout | null): string {
  if (layout === null) return 'unknown';
  return layout === 'custom' ? 'Custom wheel table' : LAYOUT_LABELS[layout];
}

export function boardLabel(board: BoardId | null): string {
  return board === null ? 'unknown' : BOARDS[board].shortName;
}

export function boardName(board: BoardId | null): string {
  return board === null ? 'unknown' : BOARDS[board].name;
}

export function problemWords(problems: RobotListItem['problems']): string {
  if (!problems) return 'head revision unreadable';
  const { errors, warnings } = problems;
  if (errors === 0 && warnings === 0) return 'none';
  const part = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  return [errors > 0 && part(errors, 'error'), warnings > 0 && part(warnings, 'warning')].filter(Boolean).join(', ');
}

/** The dashboard's "show" filter. */
export type RobotFilter = 'all' | 'errors' | 'problems' | 'clean' | 'behind';

export const ROBOT_FILTERS: { value: RobotFilter; label: string }[] = [
  { value: 'all', label: 'All robots' },
  { value: 'errors', label: 'With errors' },
  { value: 'problems', label: 'With errors or warnings' },
  { value: 'clean', label: 'Without problems' },
  { value: 'behind', label: 'Flashed revision behind head' },
];

export function robotFilterMatches(robot: RobotListItem, filter: RobotFilter): boolean {
  const p = robot.problems;
  switch (filter) {
    case 'errors':
      return (p?.errors ?? 0) > 0;
    case 'problems':
      return (p?.errors ?? 0) + (p?.warnings ?? 0) > 0;
    case 'clean':
      return p !== null && p.errors + p.warnings === 0;
    case 'behind':
      return robot.lastFlash !== null && robot.lastFlash.revisionNumber !== robot.headRevision;
    default:
      return true;
  }
}
