import type { AuditKind } from '@shared/schemas/history';

export const historyKeys = {
  all: ['history'] as const,
  robot: (robotId: string) => [...historyKeys.all, 'robot', robotId] as const,
  list: (robotId: string) => [...historyKeys.robot(robotId), 'list'] as const,
  diff: (robotId: string, from: number, to: number) => [...historyKeys.robot(robotId), 'diff', from, to] as const,
  flashes: (robotId: string) => [...historyKeys.robot(robotId), 'flashes'] as const,
  bin: (teamId: string) => [...historyKeys.all, 'bin', teamId] as const,
  audit: (teamId: string, kind: AuditKind) => [...historyKeys.all, 'audit', teamId, kind] as const,
};
