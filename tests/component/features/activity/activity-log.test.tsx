import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { ActivityLog } from '@/features/activity/components/activity-log';
import { ActivityList } from '@/features/activity/components/activity-list';
import type { TeamActivity } from '@shared/schemas/activity';
import { renderScreen, routeFetch } from '../../support/route-fetch';

const event = (id: number, action: string, detail: Record<string, unknown> = {}): TeamActivity => ({
  id,
  action,
  actorName: 'Mentor',
  target: null,
  detail,
  createdAt: '2026-03-01T10:00:00.000Z',
});

describe('the activity log', () => {
  it('describes each action in words and pages back to older events', async () => {
    const { calls } = routeFetch({
      'GET /api/teams/team-1/activity': (call) =>
        call.url.includes('before=')
          ? [200, { events: [event(3, 'user.signed_in')], nextBefore: null }]
          : [
              200,
              {
                events: [
                  event(9, 'flash.recorded', { number: 4, name: 'Aisle Scout', note: 'club night' }),
                  event(8, 'robot.deleted', { name: 'Old Kiwi' }),
                ],
                nextBefore: 8,
              },
            ],
    });
    renderScreen(<ActivityLog teamId="team-1" withSignIns />);
    expect(await screen.findByText('flashed revision 4 onto Aisle Scout: “club night”', { exact: false })).toBeTruthy();
    expect(screen.getByText('moved the robot Old Kiwi to the bin', { exact: false })).toBeTruthy();
    await userEvent.setup().click(screen.getByRole('button', { name: 'Show older' }));
    expect(await screen.findByText('signed in', { exact: false })).toBeTruthy();
    expect(calls[1].url).toBe('/api/teams/team-1/activity?kind=all&limit=50&before=8');
    expect(screen.queryByRole('button', { name: 'Show older' })).toBeNull();
  });

  it('asks again for the chosen kind of action', async () => {
    const { calls } = routeFetch({ 'GET /api/teams/team-1/activity': [200, { events: [], nextBefore: null }] });
    renderScreen(<ActivityLog teamId="team-1" withSignIns />);
    await userEvent.setup().selectOptions(await screen.findByLabelText('Show'), 'Sign-ins');
    await waitFor(() => expect(calls.at(-1)?.url).toBe('/api/teams/team-1/activity?kind=sign-ins&limit=50'));
    expect(await screen.findByText('Nothing of this kind yet')).toBeTruthy();
  });

  it('offers the sign-ins only to those who may see them', async () => {
    routeFetch({ 'GET /api/teams/team-1/activity': [200, { events: [], nextBefore: null }] });
    renderScreen(<ActivityLog teamId="team-1" withSignIns={false} />);
    const options = [...((await screen.findByLabelText('Show')) as HTMLSelectElement).options].map((o) => o.text);
    expect(options).toContain('Flashes');
    expect(options).not.toContain('Sign-ins');
  });

  it('says the bin was emptied by Mixwright itself, not by a person', () => {
    renderScreen(
      <ActivityList events={[{ ...event(5, 'robot.purged', { name: 'Old Kiwi', afterDays: 30 }), actorName: null }]} />,
    );
    expect(screen.getByText('Mixwright')).toBeTruthy();
    expect(
      screen.getByText('removed the robot Old Kiwi for good, 30 days after it was deleted', { exact: false }),
    ).toBeTruthy();
  });
});
