import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { BootLineBox } from '@/features/boot-line/components/boot-line-box';
import type { BootLineAnswer } from '@shared/schemas/boot-line';
import { renderScreen, routeFetch } from '../../support/route-fetch';

const LINE = 'boot robot="Greenhouse Cart" revision=2 hash=1a2b3c4d generator=0.1.0';

const behind: BootLineAnswer = {
  parsed: { device: 'robot', robotName: 'Greenhouse Cart', revision: 2, hash: '1a2b3c4d' },
  match: { number: 2, message: 'Flip left wheel', createdAt: '2026-02-02T10:00:00.000Z', isHead: false },
  sameConfiguration: [],
  headRevision: 3,
  verdict: 'This robot runs revision 2; the head is revision 3.',
  nameMatches: true,
};

describe('the boot-line box', () => {
  it('sends the pasted line and says which revision runs and that it is behind the head', async () => {
    const { calls } = routeFetch({ 'POST /api/robots/robot-1/boot-line': [200, behind] });
    renderScreen(<BootLineBox robotId="robot-1" />);
    const user = userEvent.setup();
    await user.click(screen.getByLabelText('Boot line from the serial monitor'));
    await user.paste(LINE);
    await user.click(screen.getByRole('button', { name: 'Which revision is this?' }));
    expect((await screen.findByRole('status')).textContent).toContain(
      'This robot runs revision 2; the head is revision 3.',
    );
    expect(screen.getByText('behind head r3')).toBeTruthy();
    expect(calls[0].body).toEqual({ line: LINE });
  });

  it('puts the reason beside the box when the line cannot be read', async () => {
    routeFetch({
      'POST /api/robots/robot-1/boot-line': [
        400,
        {
          error: {
            code: 'invalid_input',
            message: 'No boot line found',
            fields: { line: 'No boot line found: paste the line the robot prints at start-up' },
          },
        },
      ],
    });
    renderScreen(<BootLineBox robotId="robot-1" />);
    const user = userEvent.setup();
    const box = screen.getByLabelText('Boot line from the serial monitor');
    await user.type(box, 'health good=50/s');
    await user.click(screen.getByRole('button', { name: 'Which revision is this?' }));
    const reason = await screen.findByText('No boot line found: paste the line the robot prints at start-up');
    expect(box.getAttribute('aria-describedby')).toBe(reason.id);
  });
});
