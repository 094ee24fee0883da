import { render } from '@testing-library/react';
import { useState } from 'react';
import { MemoryRouter } from 'react-router';
import { robotProblems } from '@shared/problems/robot-problems';
import type { RobotConfig } from '@shared/schemas/robot-config';
import type { RevisionDetail, RobotDetail } from '@shared/schemas/robots';
import { WiringSection } from '@/features/wiring/components/wiring-section';

/** A saved revision of a configuration, as the server returns it. */
export function revisionOf(config: RobotConfig, number = 3): RevisionDetail {
  return {
    number,
    message: 'Moved the receiver',
    authorName: 'Tamsin Reed',
    createdAt: '2026-02-10T09:30:00.000Z',
    config,
  };
}

export function robotOf(config: RobotConfig): RobotDetail['robot'] {
  return {
    id: 'robot-7',
    teamId: 'team-2',
    name: config.name,
    createdAt: '2026-01-05T10:00:00.000Z',
    headRevision: 3,
    updatedAt: '2026-02-10T09:30:00.000Z',
    lastFlash: null,
    photoUrl: null,
    teamName: 'Quarry Lane Robotics',
    role: 'editor',
  };
}

/**
 * Renders the Wiring section the way the editor shell does: the draft in state, the problems
 * recomputed from it on every change. Returns a getter for the latest draft.
 */
export function renderWiring(initial: RobotConfig, options: { canEdit?: boolean } = {}) {
  let latest = initial;
  function Shell() {
    const [config, setConfig] = useState(initial);
    latest = config;
    return (
      <MemoryRouter>
        <WiringSection
          robot={robotOf(initial)}
          head={revisionOf(initial)}
          config={config}
          onChange={setConfig}
          problems={robotProblems(config)}
          canEdit={options.canEdit ?? true}
        />
      </MemoryRouter>
    );
  }
  const result = render(<Shell />);
  return { ...result, config: () => latest };
}

/** The pin picker of one role, found by its place in the configuration. */
export function pickerFor(container: HTMLElement, roleKey: string): HTMLSelectElement {
  const row = container.querySelector(`[data-role="${roleKey}"]`);
  const select = row?.querySelector('select');
  if (!select) throw new Error(`No pin picker for ${roleKey}`);
  return select;
}

export function roleRow(container: HTMLElement, roleKey: string): HTMLElement {
  const row = container.querySelector<HTMLElement>(`[data-role="${roleKey}"]`);
  if (!row) throw new Error(`No role row for ${roleKey}`);
  return row;
}
