import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { MemoryRouter } from 'react-router';
import { ActivityLog } from '@/features/activity/components/activity-log';
import { HistorySection } from '@/app/sections/history-section';
import { ImportRobotDialog } from '@/features/robot-files/components/import-robot-dialog';
import { DeletedRobotsPanel } from '@/features/robot-bin/components/robot-bin-panel';
import type { RobotDetail } from '@shared/schemas/robots';

// The answers the shooting script worked out with the real services on a scratch database,
// keyed by "METHOD /api/path"; the page's fetch is served from them.
declare const __HISTORY_FIXTURE__: { answers: Record<string, unknown>; detail: RobotDetail };
const { answers, detail } = __HISTORY_FIXTURE__;

window.fetch = (async (url: string, init?: RequestInit) => {
  const key = `${init?.method ?? 'GET'} ${url.split('?')[0]}`;
  const path = url.split('?')[0];
  const answer = key.startsWith('GET') && path.endsWith('/diff') ? answers[`GET ${url}`] : answers[key];
  return new Response(JSON.stringify(answer ?? { error: { code: 'not_found', message: `No answer for ${key}` } }), {
    status: answer ? 200 : 404,
    headers: { 'Content-Type': 'application/json' },
  });
}) as typeof fetch;

const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
const part = new URLSearchParams(location.search).get('part') ?? 'history';

export function Harness() {
  const robot = { ...detail.robot, role: 'owner' as const };
  return (
    <QueryClientProvider client={queryClient}>
      <MemoryRouter>
        <div className="mx-auto max-w-6xl p-6">
          {part === 'history' && (
            <HistorySection
              robot={robot}
              head={detail.head}
              config={detail.head.config}
              onChange={() => {}}
              problems={[]}
              canEdit
            />
          )}
          {part === 'dashboard' && (
            <div className="grid gap-6">
              <ImportRobotDialog teamId={robot.teamId} />
              <DeletedRobotsPanel teamId={robot.teamId} />
            </div>
          )}
          {part === 'activity' && <ActivityLog teamId={robot.teamId} withSignIns />}
        </div>
      </MemoryRouter>
    </QueryClientProvider>
  );
}
