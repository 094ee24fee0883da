import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { MemoryRouter } from 'react-router';
import type { HistoryEntry, RobotHistory } from '@shared/schemas/history';
import type { RobotDetail } from '@shared/schemas/robots';
import { robotConfig } from '../../factories/robot-config';

export interface Call {
  method: string;
  url: string;
  body: unknown;
}

type Handler = (call: Call) => [number, unknown];

/**
 * Replaces fetch with one that answers by "METHOD /api/path" (query string left off), so a
 * screen that makes several requests can be tested; every call is kept.
 */
export function routeFetch(handlers: Record<string, Handler | [number, unknown]>): { calls: Call[] } {
  const calls: Call[] = [];
  globalThis.fetch = (async (url: string, init?: RequestInit) => {
    const call = {
      method: init?.method ?? 'GET',
      url,
      body: init?.body instanceof FormData ? init.body : init?.body ? JSON.parse(String(init.body)) : undefined,
    };
    calls.push(call);
    const key = `${call.method} ${url.split('?')[0]}`;
    const handler = handlers[key];
    if (!handler)
      return new Response(JSON.stringify({ error: { code: 'not_found', message: `No test answer for ${key}` } }), {
        status: 404,
      });
    const [status, body] = typeof handler === 'function' ? handler(call) : handler;
    return new Response(status === 204 ? null : JSON.stringify(body), {
      status,
      headers: { 'Content-Type': 'application/json' },
    });
  }) as typeof fetch;
  return { calls };
}

export function renderScreen(ui: ReactElement) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={queryClient}>
      <MemoryRouter>{ui}</MemoryRouter>
    </QueryClientProvider>,
  );
}

export function robotOf(overrides: Partial<RobotDetail['robot']> = {}): RobotDetail['robot'] {
  return {
    id: 'robot-1',
    teamId: 'team-1',
    name: 'Greenhouse Cart',
    createdAt: '2026-02-01T10:00:00.000Z',
    headRevision: 3,
    updatedAt: '2026-02-03T10:00:00.000Z',
    lastFlash: null,
    photoUrl: null,
    teamName: 'Larkspur Makers Club',
    role: 'editor',
    ...overrides,
  };
}

export function entry(number: number, overrides: Partial<HistoryEntry> = {}): HistoryEntry {
  return {
    number,
    message: `Change ${number}`,
    authorName: 'Priya Okafor',
    createdAt: `2026-02-0${number}T10:00:00.000Z`,
    problems: { errors: 0, warnings: 0 },
    flashes: [],
    ...overrides,
  };
}

export function historyOf(entries: HistoryEntry[], lastFlash: RobotHistory['lastFlash'] = null): RobotHistory {
  return { headRevision: Math.max(...entries.map((e) => e.number)), revisions: entries, lastFlash };
}

export function sectionProps(robot = robotOf()) {
  const config = robotConfig();
  return {
    robot,
    head: {
      number: robot.headRevision,
      message: 'Head',
      authorName: 'Priya Okafor',
      createdAt: robot.updatedAt,
      config,
    },
    config,
    onChange: () => {},
    problems: [],
    canEdit: robot.role !== 'viewer',
  };
}
