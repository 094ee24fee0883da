import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { FlashLogPanel } from '@/features/flash-log/components/flash-log-panel';
import { renderScreen, routeFetch } from '../../support/route-fetch';

const flash = {
  id: 7,
  revisionNumber: 2,
  flashedAt: '2026-03-01T18:00:00.000Z',
  flashedByName: 'Student Lead',
  note: 'bench test passed',
  createdAt: '2026-03-01T18:00:00.000Z',
};

describe('the flash log panel', () => {
  it('records the chosen revision with a time and a note', async () => {
    const { calls } = routeFetch({
      'GET /api/robots/robot-1/flashes': [200, { flashes: [] }],
      'POST /api/robots/robot-1/flashes': [201, { flash }],
    });
    renderScreen(<FlashLogPanel robotId="robot-1" revisions={[3, 2, 1]} headRevision={3} canEdit />);
    const user = userEvent.setup();
    expect((screen.getByLabelText('Revision') as HTMLSelectElement).value).toBe('3');
    await user.selectOptions(screen.getByLabelText('Revision'), 'r2');
    await user.type(screen.getByLabelText('Note'), 'bench test passed');
    await user.click(screen.getByRole('button', { name: 'Record flash' }));
    await waitFor(() => expect(calls.some((c) => c.method === 'POST')).toBe(true));
    const body = calls.find((c) => c.method === 'POST')!.body as { revision: number; note: string; flashedAt: string };
    expect(body).toMatchObject({ revision: 2, note: 'bench test passed' });
    expect(Number.isNaN(Date.parse(body.flashedAt))).toBe(false);
  });

  it('lists earlier flashes, newest first, for everyone', async () => {
    routeFetch({ 'GET /api/robots/robot-1/flashes': [200, { flashes: [flash] }] });
    renderScreen(<FlashLogPanel robotId="robot-1" revisions={[2, 1]} headRevision={2} canEdit={false} />);
    expect((await screen.findByText('“bench test passed”')).closest('li')!.textContent).toContain('Student Lead');
    expect(screen.queryByRole('button', { name: 'Record flash' })).toBeNull();
  });
});
