import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { DeletedRobotsPanel } from '@/features/robot-bin/components/robot-bin-panel';
import { renderScreen, robotOf, routeFetch } from '../../support/route-fetch';

const binned = {
  id: 'robot-5',
  name: 'Aisle Scout',
  headRevision: 4,
  deletedAt: '2026-03-01T10:00:00.000Z',
  deletedByName: 'Mentor',
  restorableUntil: '2026-03-31T10:00:00.000Z',
};

describe('the deleted robots panel', () => {
  it('lists deleted robots with the last day they can come back, and restores one', async () => {
    const { calls } = routeFetch({
      'GET /api/teams/team-1/robot-bin': () => [
        200,
        { robots: calls.some((c) => c.method === 'POST') ? [] : [binned] },
      ],
      'POST /api/teams/team-1/robot-bin/robot-5/restore': [
        200,
        { robot: robotOf({ id: 'robot-5', name: 'Aisle Scout' }) },
      ],
    });
    renderScreen(<DeletedRobotsPanel teamId="team-1" />);
    expect((await screen.findByText(/deleted 1 Mar 2026 by Mentor/)).textContent).toContain(
      'restorable until 31 Mar 2026',
    );
    await userEvent.setup().click(screen.getByRole('button', { name: 'Restore Aisle Scout' }));
    await waitFor(() => expect(screen.queryByText('Aisle Scout')).toBeNull());
  });

  it('shows nothing when the bin is empty', async () => {
    const { calls } = routeFetch({ 'GET /api/teams/team-1/robot-bin': [200, { robots: [] }] });
    const { container } = renderScreen(<DeletedRobotsPanel teamId="team-1" />);
    await waitFor(() => expect(calls).toHaveLength(1));
    expect(container.textContent).toBe('');
  });
});
