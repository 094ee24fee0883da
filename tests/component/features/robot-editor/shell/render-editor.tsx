import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider, useParams } from 'react-router';
import { vi } from 'vitest';
import { RobotEditor, type RobotEditorProps } from '@/features/robot-editor/components/shell/robot-editor';
import type { SectionRegistry } from '@/lib/editor-sections';
import { SafetySection } from '@/features/robot-editor/sections/safety-section';
import type { RevisionDetail, RobotDetail, SaveRevisionInput } from '@shared/schemas/robots';
import { robotConfig } from '../../../../factories/robot-config';

export function revisionDetail(number: number, config = robotConfig(), message = `Revision ${number}`): RevisionDetail {
  return { number, message, authorName: 'Orla', createdAt: '2026-03-01T10:00:00.000Z', config };
}

export function robotDetail(
  overrides: { role?: RobotDetail['robot']['role']; head?: RevisionDetail } = {},
): RobotDetail {
  const head = overrides.head ?? revisionDetail(3);
  return {
    robot: {
      id: 'robot-1',
      teamId: 'team-1',
      teamName: 'Hilltop Rover Club',
      name: 'Test Rover',
      createdAt: '2026-03-01T10:00:00.000Z',
      headRevision: head.number,
      updatedAt: head.createdAt,
      lastFlash: null,
      photoUrl: null,
      role: overrides.role ?? 'editor',
    },
    head,
  };
}

/** The editor at `/teams/team-1/robots/robot-1/<section>` in a memory router, with the Safety section unless told. */
export function renderEditor(
  detail: RobotDetail,
  options: {
    save?: (input: SaveRevisionInput) => Promise<RevisionDetail>;
    revisions?: Record<number, RevisionDetail>;
    path?: string;
    sections?: SectionRegistry;
  } = {},
) {
  const save = vi.fn(
    options.save ??
      (async (input: SaveRevisionInput) =>
        revisionDetail(detail.head.number + 1, input.config as RevisionDetail['config'], input.message)),
  );
  const revisions = options.revisions ?? {};
  const queryClient = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  // The section follows the path, as in the app, so links between sections can be followed.
  function EditorAt() {
    const { section = 'safety' } = useParams();
    return (
      <RobotEditor
        detail={detail}
        userId="user-1"
        section={section as RobotEditorProps['section']}
        sections={options.sections ?? { safety: SafetySection }}
        basePath="/teams/team-1/robots/robot-1"
        save={save}
        revisionQuery={(n) => ({ queryKey: ['revision', n], queryFn: async () => revisions[n] })}
        onStale={() => {}}
      />
    );
  }
  const router = createMemoryRouter(
    [
      { path: '/teams/:teamId/robots/:robotId/:section', element: <EditorAt /> },
      { path: '/teams/:teamId', element: <p>Team page</p> },
    ],
    { initialEntries: [options.path ?? '/teams/team-1/robots/robot-1/safety'] },
  );
  const view = render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...view, save, router };
}
