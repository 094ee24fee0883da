import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { HistorySection } from '@/app/sections/history-section';
import { fileDiff } from '@shared/history/file-diff';
import type { RevisionDiff } from '@shared/schemas/history';
import { entry, historyOf, renderScreen, robotOf, routeFetch, sectionProps } from '../../support/route-fetch';

const HISTORY = historyOf(
  [
    entry(3, { message: 'Quicker failsafe', problems: { errors: 1, warnings: 2 } }),
    entry(2, {
      message: 'Flip left wheel',
      flashes: [{ flashedAt: '2026-02-02T18:00:00.000Z', flashedByName: 'Priya Okafor' }],
    }),
    entry(1, { message: 'First revision' }),
  ],
  {
    id: 1,
    revisionNumber: 2,
    flashedAt: '2026-02-02T18:00:00.000Z',
    flashedByName: 'Priya Okafor',
    note: '',
    createdAt: '2026-02-02T18:00:00.000Z',
  },
);

function diffOf(from: number, to: number): RevisionDiff {
  return {
    from: {
      number: from,
      message: `Change ${from}`,
      authorName: 'Priya Okafor',
      createdAt: '2026-02-02T10:00:00.000Z',
    },
    to: { number: to, message: `Change ${to}`, authorName: 'Priya Okafor', createdAt: '2026-02-03T10:00:00.000Z' },
    settings: [
      {
        path: ['safety', 'failsafeTimeoutMs'],
        section: 'Safety',
        subject: 'Safety',
        field: 'failsafe timeout',
        kind: 'changed',
        from: '250 ms',
        to: '150 ms',
        text: 'Safety: failsafe timeout 250 ms → 150 ms',
      },
    ],
    files: {
      available: true,
      changed: [
        fileDiff(
          'greenhouse_cart/mw_config.h',
          '#pragma once\n#define MW_FAILSAFE_MS 250\n',
          '#pragma once\n#define MW_FAILSAFE_MS 150\n',
        ),
      ],
      stampOnly: ['greenhouse_cart/mw_mixer.h'],
      unchanged: [],
    },
  };
}

function answers(extra = {}) {
  return routeFetch({
    'GET /api/robots/robot-1/history': [200, HISTORY],
    'GET /api/robots/robot-1/diff': (call) => {
      const q = new URL(call.url, 'http://x').searchParams;
      return [200, diffOf(Number(q.get('from')), Number(q.get('to')))];
    },
    'GET /api/robots/robot-1/flashes': [200, { flashes: [] }],
    ...extra,
  });
}

describe('the history section', () => {
  it('lists every revision with its problems and which one is on the robot', async () => {
    answers();
    renderScreen(<HistorySection {...sectionProps()} />);
    const table = await screen.findByRole('table', { name: /Revisions, newest first/ });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((r) => within(r).getByText(/^r\d$/).textContent)).toEqual(['r3', 'r2', 'r1']);
    expect(within(rows[0]).getByText('1 error · 2 warnings')).toBeTruthy();
    expect(within(rows[1]).getByText(/on the robot/)).toBeTruthy();
    expect(within(rows[2]).getByText('no problems')).toBeTruthy();
  });

  it('compares the head with the revision before it until two are chosen', async () => {
    const { calls } = answers();
    renderScreen(<HistorySection {...sectionProps()} />);
    expect(await screen.findByText('failsafe timeout', { exact: false })).toBeTruthy();
    expect(calls.some((c) => c.url === '/api/robots/robot-1/diff?from=2&to=3')).toBe(true);
    await userEvent.setup().click(screen.getByRole('radio', { name: 'Compare from revision 1' }));
    await waitFor(() => expect(calls.some((c) => c.url === '/api/robots/robot-1/diff?from=1&to=3')).toBe(true));
  });

  it('shows the generated files side by side with the changed part marked', async () => {
    answers();
    renderScreen(<HistorySection {...sectionProps()} />);
    const table = await screen.findByRole('table', {
      name: /mw_config.h: revision 2 on the left, revision 3 on the right/,
    });
    const marks = table.querySelectorAll('mark');
    expect([...marks].map((m) => m.textContent)).toEqual(['2', '1']);
    expect(screen.getByText(/1 file differs only in the revision stamp/)).toBeTruthy();
  });

  it('restores a revision with a note, on top of the head it showed', async () => {
    const { calls } = answers({
      'POST /api/robots/robot-1/revisions/1/restore': [
        201,
        { revision: { number: 4, message: 'Restored revision 1: back to basics' } },
      ],
    });
    renderScreen(<HistorySection {...sectionProps()} />);
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Restore revision 1' }));
    await user.type(screen.getByLabelText('Why restore revision 1? (optional)'), 'back to basics');
    await user.click(screen.getByRole('button', { name: 'Restore as revision 4' }));
    await waitFor(() =>
      expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ baseRevision: 3, note: 'back to basics' }),
    );
  });

  it('shows a viewer everything but no way to change anything', async () => {
    answers();
    renderScreen(<HistorySection {...sectionProps(robotOf({ role: 'viewer' }))} />);
    await screen.findByRole('table', { name: /Revisions, newest first/ });
    expect(screen.queryByRole('button', { name: /^Restore/ })).toBeNull();
    expect(screen.queryByRole('form', { name: 'Record a flash' })).toBeNull();
    expect(screen.queryByRole('form', { name: 'Import as a new revision' })).toBeNull();
    expect(screen.getByRole('link', { name: /Download greenhouse_cart-r3.json/ }).getAttribute('href')).toBe(
      '/api/robots/robot-1/revisions/3/export',
    );
  });

  it('offers the bin to owners only', async () => {
    answers();
    renderScreen(<HistorySection {...sectionProps(robotOf({ role: 'owner' }))} />);
    expect(await screen.findByRole('button', { name: 'Move Greenhouse Cart to the bin' })).toBeTruthy();
  });
});
