import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router';
import { describe, expect, it } from 'vitest';
import { WhichRobotPanel } from '@/features/boot-line/components/which-robot-panel';
import type { BootLineAnswer, TeamBootLineAnswer } from '@shared/schemas/boot-line';
import { answerFetch, renderWithQuery } from '../../support/render';

const LINE = 'boot robot="Garden Hauler" revision=2 hash=1a2b3c4d generator=0.1.0 board=uno input=rc-pwm';
const PARSED: BootLineAnswer['parsed'] = { device: 'robot', robotName: 'Garden Hauler', revision: 2, hash: '1a2b3c4d' };

function found(overrides: Partial<TeamBootLineAnswer> = {}): TeamBootLineAnswer {
  return {
    parsed: PARSED,
    robot: { id: 'robot-7', name: 'Garden Hauler' },
    foundBy: 'hash',
    answer: {
      parsed: PARSED,
      match: { number: 2, message: 'Softer ramp', createdAt: '2026-03-02T10:00:00.000Z', isHead: false },
      sameConfiguration: [],
      headRevision: 5,
      verdict: 'This robot runs revision 2; the head is revision 5.',
      nameMatches: true,
    },
    otherRobots: [],
    verdict: 'This is Garden Hauler: one of its revisions has the configuration hash 1a2b3c4d.',
    ...overrides,
  };
}

function renderPanel() {
  renderWithQuery(
    <MemoryRouter>
      <WhichRobotPanel teamId="team-1" />
    </MemoryRouter>,
  );
  return userEvent.setup();
}

async function pasteAndAsk(user: ReturnType<typeof userEvent.setup>, line: string) {
  await user.click(screen.getByLabelText('Boot line'));
  await user.paste(line);
  await user.click(screen.getByRole('button', { name: 'Find the robot' }));
}

describe('the which-robot panel', () => {
  it('sends the pasted line to the team and links the robot found to its history', async () => {
    const { calls } = answerFetch(200, found());
    const user = renderPanel();
    await pasteAndAsk(user, LINE);
    const status = await screen.findByRole('status');
    expect(within(status).getByRole('link', { name: 'Garden Hauler — history' }).getAttribute('href')).toBe(
      '/teams/team-1/robots/robot-7/history',
    );
    expect(status.textContent).toContain('revision 2');
    expect(status.textContent).toContain('Found by configuration hash');
    expect(within(status).getByText('behind head r5')).toBeTruthy();
    expect(calls[0].url).toBe('/api/teams/team-1/boot-line');
    expect(JSON.parse(String(calls[0].init?.body))).toEqual({ line: LINE });
  });

  it('says the robot runs the head when it does', async () => {
    const answer = found();
    answerFetch(
      200,
      found({ answer: { ...answer.answer!, match: { ...answer.answer!.match!, number: 5, isHead: true } } }),
    );
    const user = renderPanel();
    await pasteAndAsk(user, LINE);
    expect(within(await screen.findByRole('status')).getByText('head')).toBeTruthy();
  });

  it('says plainly when no robot in the team matches', async () => {
    const verdict =
      'No robot in this team matches: no revision has the configuration hash 1a2b3c4d and no robot is called “Garden Hauler”.';
    answerFetch(200, found({ robot: null, foundBy: null, answer: null, verdict }));
    const user = renderPanel();
    await pasteAndAsk(user, LINE);
    const status = await screen.findByRole('status');
    expect(status.textContent).toBe(verdict);
    expect(within(status).queryByRole('link')).toBeNull();
  });

  it('puts the server’s reason beside the box when the line cannot be read', async () => {
    const reason = 'No boot line found: paste the line the robot prints at start-up';
    answerFetch(400, { error: { code: 'invalid_input', message: 'No boot line found', fields: { line: reason } } });
    const user = renderPanel();
    await pasteAndAsk(user, 'health good=50/s');
    const shown = await screen.findByText(reason);
    expect(screen.getByLabelText('Boot line').getAttribute('aria-describedby')).toBe(shown.id);
  });

  it('asks for a line before sending an empty box', async () => {
    const { calls } = answerFetch(200, found());
    const user = renderPanel();
    await user.click(screen.getByRole('button', { name: 'Find the robot' }));
    expect(await screen.findByText('Paste the boot line')).toBeTruthy();
    expect(calls).toHaveLength(0);
  });
});
