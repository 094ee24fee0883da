import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { ImportRobotDialog } from '@/features/robot-files/components/import-robot-dialog';
import { renderScreen, robotOf, routeFetch } from '../../support/route-fetch';

const file = () => new File(['{"schemaVersion":1}'], 'greenhouse_cart-r3.json', { type: 'application/json' });

describe('the import dialog', () => {
  it('uploads the file and the name as a form, then reports what the import did', async () => {
    const robot = robotOf({ id: 'robot-9', name: 'Bench Copy', headRevision: 1 });
    const { calls } = routeFetch({
      'POST /api/teams/team-1/robots/import': [
        201,
        { robot, robotId: 'robot-9', revision: 1, fromVersion: 1, notes: ['Converted from schema version 1 to 2.'] },
      ],
    });
    const onImported = vi.fn();
    renderScreen(<ImportRobotDialog teamId="team-1" onImported={onImported} />);
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Import a robot' }));
    const dialog = screen.getByRole('dialog', { name: 'Import a robot' });
    await user.upload(screen.getByLabelText('Configuration file (.json) or firmware bundle (.zip)'), file());
    await user.type(screen.getByLabelText(/Robot name/), 'Bench Copy');
    await user.click(screen.getByRole('button', { name: 'Import robot' }));
    expect(await screen.findByText('Bench Copy was added with revision 1.')).toBeTruthy();
    expect(dialog.textContent).toContain('Converted from schema version 1 to 2.');
    const form = calls[0].body as FormData;
    expect(form.get('name')).toBe('Bench Copy');
    expect((form.get('file') as File).name).toBe('greenhouse_cart-r3.json');
    await user.click(screen.getByRole('button', { name: 'Open Bench Copy' }));
    expect(onImported).toHaveBeenCalledWith(robot);
  });

  it('shows why a file was refused', async () => {
    routeFetch({
      'POST /api/teams/team-1/robots/import': [
        400,
        {
          error: {
            code: 'import_rejected',
            message: 'The zip has an unsafe path: "../x" climbs out of the archive with ..',
            fields: { file: '…' },
          },
        },
      ],
    });
    renderScreen(<ImportRobotDialog teamId="team-1" />);
    const user = userEvent.setup();
    await user.click(screen.getByRole('button', { name: 'Import a robot' }));
    await user.upload(screen.getByLabelText('Configuration file (.json) or firmware bundle (.zip)'), file());
    await user.click(screen.getByRole('button', { name: 'Import robot' }));
    expect((await screen.findByRole('alert')).textContent).toBe(
      'The zip has an unsafe path: "../x" climbs out of the archive with ..',
    );
  });

  it('closes with Escape and gives focus back to its button', async () => {
    routeFetch({});
    renderScreen(<ImportRobotDialog teamId="team-1" />);
    const user = userEvent.setup();
    const opener = screen.getByRole('button', { name: 'Import a robot' });
    await user.click(opener);
    await user.keyboard('{Escape}');
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(document.activeElement).toBe(opener);
  });
});
