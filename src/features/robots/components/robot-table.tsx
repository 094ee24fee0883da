import { TBody, THead, Table, Td, Th, Tr } from '@/components/ui/table';
import { formatDate } from '@/lib/format';
import type { RobotSummary } from '@shared/schemas/robots';

export function RobotTable({ robots, teamName }: { robots: RobotSummary[]; teamName: string }) {
  return (
    <Table caption={`Robots of ${teamName}`}>
      <THead>
        <tr>
          <Th>Robot</Th>
          <Th>Created</Th>
          <Th className="text-right">Head revision</Th>
          <Th>Last saved</Th>
          <Th>On the robot</Th>
        </tr>
      </THead>
      <TBody>
        {robots.map((robot) => (
          <Tr key={robot.id}>
            <Td className="font-semibold">
              <span className="inline-flex items-center gap-2">
                {robot.photoUrl && <img src={robot.photoUrl} alt="" width={32} height={32} loading="lazy" className="size-8 rounded border border-rule object-cover" />}
                {robot.name}
              </span>
            </Td>
            <Td className="text-ink-muted">{formatDate(robot.createdAt)}</Td>
            <Td className="text-right font-mono">r{robot.headRevision}</Td>
            <Td className="text-ink-muted">{formatDate(robot.updatedAt)}</Td>
            <Td>
              {robot.lastFlash ? (
                <span>
                  <span className="font-mono">r{robot.lastFlash.revisionNumber}</span>
                  <span className="text-ink-muted"> · flashed {formatDate(robot.lastFlash.flashedAt)}</span>
                  {robot.lastFlash.revisionNumber !== robot.headRevision && (
                    <span className="ml-2 rounded border border-warn/30 bg-warn-soft px-1.5 py-0.5 text-xs font-semibold text-warn-strong">
                      behind head
                    </span>
                  )}
                </span>
              ) : (
                <span className="text-ink-faint">not flashed yet</span>
              )}
            </Td>
          </Tr>
        ))}
      </TBody>
    </Table>
  );
}
