import { QueryClient, QueryClientProvider, useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { MemoryRouter, Route, Routes } from 'react-router';
import { assignPins } from '@shared/pins/assign-pins';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RobotDetail, RobotSummary } from '@shared/schemas/robots';
import { FirmwareSection } from '@/features/firmware/components/firmware-section';
import { apiRequest } from '@/lib/api-client';

// A page for looking at the Firmware section against the demo club's robots (the API is proxied
// to a seeded app): ?robot=<name>[&wire=1][&draft=1][&viewer=1][&unwire=1][&check=1].
const params = new URLSearchParams(window.location.search);
const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });

async function loadRobot(): Promise<RobotDetail> {
  const teams = (await apiRequest<{ teams: { id: string }[] }>('/teams')).teams;
  const robots = (await apiRequest<{ robots: RobotSummary[] }>(`/teams/${teams[0].id}/robots`)).robots;
  const wanted = robots.find((r) => r.name === (params.get('robot') ?? 'Greenhouse Cart')) ?? robots[0];
  const detail = await apiRequest<RobotDetail>(`/robots/${wanted.id}`);
  if (params.get('wire') !== '1') return detail;
  const placed = assignPins(detail.head.config);
  if (!placed.ok) throw new Error(placed.reason);
  const body = { baseRevision: detail.head.number, message: 'Pins placed automatically', config: placed.config };
  await apiRequest(`/robots/${wanted.id}/revisions`, { method: 'POST', body });
  return apiRequest<RobotDetail>(`/robots/${wanted.id}`);
}

function draftOf(config: RobotConfig): RobotConfig {
  let next = structuredClone(config);
  if (params.get('draft') === '1') next = { ...next, safety: { ...next.safety, failsafeTimeoutMs: 180 } };
  if (params.get('unwire') === '1') next.wiring.drivers[0].pins = {};
  return next;
}

function Section() {
  const detail = useQuery({ queryKey: ['harness-robot'], queryFn: loadRobot });
  const [config, setConfig] = useState<RobotConfig | null>(null);
  if (!detail.data) return <p>{detail.error ? String(detail.error) : 'Loading the demo robot…'}</p>;
  const { robot, head } = detail.data;
  return (
    <FirmwareSection
      robot={robot}
      head={head}
      config={config ?? draftOf(head.config)}
      onChange={setConfig}
      problems={[]}
      canEdit={params.get('viewer') !== '1'}
    />
  );
}

export function Harness() {
  return (
    <QueryClientProvider client={queryClient}>
      <MemoryRouter initialEntries={['/teams/t/robots/r/firmware']}>
        <div className="mx-auto max-w-[76rem] p-6">
          <Routes>
            <Route path="/teams/:teamId/robots/:robotId/:section" element={<Section />} />
          </Routes>
        </div>
      </MemoryRouter>
    </QueryClientProvider>
  );
}
