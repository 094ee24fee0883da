import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactElement } from 'react';
import { MemoryRouter, Route, Routes, useLocation } from 'react-router';
import type { FirmwareFile, FirmwareFiles, SketchCheck, VerifyResult } from '@shared/schemas/firmware';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { SectionProps } from '@/lib/editor-sections';
import { wiredConfig } from '../../../factories/wired-config';

export function firmwareFile(path: string, content: string): FirmwareFile {
  const language = /\.(ino|h)$/.test(path)
    ? 'cpp'
    : path.endsWith('.json')
      ? 'json'
      : path.endsWith('.md')
        ? 'markdown'
        : 'text';
  return { path, content, size: new TextEncoder().encode(content).length, language };
}

/** A small bundle as the server answers it; `remote` adds the transmitter sketch. */
export function firmwareFiles(overrides: Partial<FirmwareFiles> & { remote?: boolean } = {}): FirmwareFiles {
  const { remote = false, ...rest } = overrides;
  const folder = rest.sketchFolder ?? 'greenhouse_cart';
  const revision = rest.revision ?? 1;
  const files = [
    firmwareFile(
      `${folder}/${folder}.ino`,
      '#include "mw_config.h"\n\nvoid setup() {\n  mw_print_boot();\n}\n\nvoid loop() {}\n',
    ),
    firmwareFile(
      `${folder}/mw_config.h`,
      `#pragma once\n#define MW_REVISION ${revision}UL\n#define MW_CONFIG_HASH "1a2b3c4d"\n`,
    ),
    ...(remote
      ? [
          firmwareFile(`${folder}_remote/${folder}_remote.ino`, '// transmitter\nvoid setup() {}\nvoid loop() {}\n'),
          firmwareFile(`${folder}_remote/mw_link_packet.h`, '#pragma once\n#define LINK_PACKET_VERSION 1\n'),
        ]
      : []),
    firmwareFile('README.md', '# Greenhouse Cart\n\nTest with the wheels off the ground first.\n'),
    firmwareFile('config.json', '{\n  "name": "Greenhouse Cart"\n}\n'),
    firmwareFile('manifest.json', '{\n  "revision": 1\n}\n'),
  ];
  return {
    robotName: 'Greenhouse Cart',
    revision,
    draft: false,
    hash: '1a2b3c4d',
    sketchFolder: folder,
    remoteFolder: remote ? `${folder}_remote` : null,
    bootLine: `boot robot="Greenhouse Cart" revision=${revision} hash=1a2b3c4d generator=0.1.0 board=uno input=rc-pwm`,
    files,
    ...rest,
  };
}

export function sketchCheck(overrides: Partial<SketchCheck> = {}): SketchCheck {
  return {
    folder: 'greenhouse_cart',
    board: 'uno',
    ok: true,
    flashBytes: 12_345,
    flashMax: 32_256,
    ramBytes: 700,
    ramMax: 2048,
    ...overrides,
  };
}

export function verifyResult(sketches: SketchCheck[] = [sketchCheck()]): VerifyResult {
  return { hash: 'f'.repeat(64), sketches };
}

/** The props the editor shell hands a section: head revision 3, the draft equal to it unless given. */
export function sectionProps(overrides: Partial<SectionProps> = {}): SectionProps {
  const config = wiredConfig();
  return {
    robot: {
      id: 'r1',
      teamId: 't1',
      name: 'Greenhouse Cart',
      createdAt: '2026-11-30T10:00:00.000Z',
      headRevision: 3,
      updatedAt: '2026-12-01T10:00:00.000Z',
      lastFlash: null,
      photoUrl: null,
      teamName: 'Larkspur Makers Club',
      role: 'editor',
    },
    head: {
      number: 3,
      message: 'Pins placed',
      authorName: 'Student Lead',
      createdAt: '2026-12-01T10:00:00.000Z',
      config,
    },
    config,
    onChange: () => {},
    problems: [],
    canEdit: true,
    ...overrides,
  };
}

/** A copy of the configuration with one change, as an edit in the draft would make. */
export function changed(config: RobotConfig, change: (c: RobotConfig) => void): RobotConfig {
  const copy = structuredClone(config);
  change(copy);
  return copy;
}

export interface FetchCall {
  method: string;
  url: string;
  body: unknown;
}

/** Answers fetch by "METHOD path" (path without /api); unknown requests get 404. */
export function routeFetch(
  routes: Record<string, { status?: number; body: unknown } | (() => { status?: number; body: unknown })>,
) {
  const calls: FetchCall[] = [];
  globalThis.fetch = (async (url: string, init?: RequestInit) => {
    const method = init?.method ?? 'GET';
    calls.push({ method, url, body: init?.body ? JSON.parse(String(init.body)) : undefined });
    const route = routes[`${method} ${url.replace(/^\/api/, '')}`];
    const answer =
      typeof route === 'function'
        ? route()
        : (route ?? { status: 404, body: { error: { code: 'not_found', message: 'No route' } } });
    return new Response(JSON.stringify(answer.body), {
      status: answer.status ?? 200,
      headers: { 'Content-Type': 'application/json' },
    });
  }) as typeof fetch;
  return { calls };
}

function Where() {
  const location = useLocation();
  return <div data-testid="location">{`${location.pathname}${location.search}`}</div>;
}

/** Renders inside the editor's route (`/teams/t1/robots/r1/firmware`) with a fresh query client. */
export function renderInEditor(ui: ReactElement) {
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  const wrap = (element: ReactElement) => (
    <QueryClientProvider client={queryClient}>
      <MemoryRouter initialEntries={['/teams/t1/robots/r1/firmware']}>
        <Routes>
          <Route
            path="/teams/:teamId/robots/:robotId/:section"
            element={
              <>
                {element}
                <Where />
              </>
            }
          />
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>
  );
  const result = render(wrap(ui));
  return { ...result, rerender: (next: ReactElement) => result.rerender(wrap(next)) };
}
