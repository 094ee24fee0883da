import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { robotConfig } from '../../../../factories/robot-config';
import { renderEditor, revisionDetail, robotDetail } from './render-editor';

beforeEach(() => localStorage.clear());

describe('the robot editor', () => {
  it('marks an edit as unsaved and keeps it as a draft', async () => {
    const user = userEvent.setup();
    renderEditor(robotDetail());
    expect(screen.getByText('No unsaved changes')).toBeTruthy();
    const failsafe = screen.getByLabelText('Failsafe after');
    await user.clear(failsafe);
    await user.type(failsafe, '150');
    expect(screen.getByText(/Unsaved changes on r3/)).toBeTruthy();
    expect(localStorage.getItem('mixwright:draft:user-1:robot-1')).toContain('"failsafeTimeoutMs":150');
  });

  it('shows the schema’s reason beside a field and will not save until it is fixed', async () => {
    const user = userEvent.setup();
    renderEditor(robotDetail());
    const failsafe = screen.getByLabelText('Failsafe after');
    await user.clear(failsafe);
    await user.type(failsafe, '20');
    expect(screen.getByText('✕ Must be at least 50')).toBeTruthy();
    expect(failsafe.getAttribute('aria-invalid')).toBe('true');
    await user.click(screen.getByRole('button', { name: 'Save…' }));
    const dialog = await screen.findByRole('dialog');
    expect(within(dialog).getByText(/1 field needs fixing/)).toBeTruthy();
    expect((within(dialog).getByRole('button', { name: 'Save revision' }) as HTMLButtonElement).disabled).toBe(true);
  });

  it('asks for a message, then saves on top of the head revision', async () => {
    const user = userEvent.setup();
    const { save } = renderEditor(robotDetail());
    const ramp = screen.getByLabelText('Ramp limit');
    await user.clear(ramp);
    await user.type(ramp, '6');
    await user.click(screen.getByRole('button', { name: 'Save…' }));
    const dialog = await screen.findByRole('dialog');
    expect(within(dialog).getByText('Safety › ramp limit')).toBeTruthy();
    await user.click(within(dialog).getByRole('button', { name: 'Save revision' }));
    expect(await within(dialog).findByText('Say what changed')).toBeTruthy();
    await user.type(within(dialog).getByLabelText('What changed, and why?'), 'Gentler ramp');
    await user.click(within(dialog).getByRole('button', { name: 'Save revision' }));
    await waitFor(() => expect(save).toHaveBeenCalledTimes(1));
    expect(save.mock.calls[0][0]).toMatchObject({
      baseRevision: 3,
      message: 'Gentler ramp',
      config: { safety: { rampPerSecond: 6 } },
    });
    expect(await screen.findByText('Saved as r4.')).toBeTruthy();
    expect(localStorage.getItem('mixwright:draft:user-1:robot-1')).toBeNull();
  });

  it('shows both versions when someone saved first, and rebases the draft field by field', async () => {
    const user = userEvent.setup();
    const base = robotConfig();
    const theirs = { ...base, safety: { ...base.safety, failsafeTimeoutMs: 180 } };
    const conflict = new ApiError(409, {
      code: 'revision_conflict',
      message: 'Revision 4 was saved',
      head: { number: 4, message: 'Faster failsafe', authorName: 'Wren', createdAt: '2026-03-02T10:00:00.000Z' },
    } as never);
    const { save } = renderEditor(robotDetail({ head: revisionDetail(3, base) }), {
      save: async () => {
        throw conflict;
      },
      revisions: { 3: revisionDetail(3, base), 4: revisionDetail(4, theirs, 'Faster failsafe') },
    });
    const ramp = screen.getByLabelText('Ramp limit');
    await user.clear(ramp);
    await user.type(ramp, '6');
    await user.click(screen.getByRole('button', { name: 'Save…' }));
    await user.type(within(await screen.findByRole('dialog')).getByLabelText('What changed, and why?'), 'Gentler ramp');
    await user.click(screen.getByRole('button', { name: 'Save revision' }));
    const dialog = await screen.findByRole('dialog', { name: 'Revision r4 was saved while you were editing' });
    const failsafeRow = await within(dialog).findByRole('row', { name: /failsafe timeout/ });
    expect(within(failsafeRow).getByText('they changed it')).toBeTruthy();
    expect((within(failsafeRow).getByLabelText('Theirs') as HTMLInputElement).checked).toBe(true);
    const rampRow = within(dialog).getByRole('row', { name: /ramp limit/ });
    expect((within(rampRow).getByLabelText('Mine') as HTMLInputElement).checked).toBe(true);
    await user.click(within(dialog).getByRole('button', { name: 'Move my draft onto r4' }));
    const saveDialog = await screen.findByRole('dialog', { name: 'Save a new revision' });
    expect((within(saveDialog).getByLabelText('What changed, and why?') as HTMLInputElement).value).toBe(
      'Gentler ramp',
    );
    expect(save).toHaveBeenCalledTimes(1);
    expect(localStorage.getItem('mixwright:draft:user-1:robot-1')).toContain('"baseRevision":4');
    expect(localStorage.getItem('mixwright:draft:user-1:robot-1')).toContain('"failsafeTimeoutMs":180');
  });

  it('shows a viewer everything read-only, with no save', () => {
    renderEditor(robotDetail({ role: 'viewer' }));
    expect(screen.getByText('Read only: you are a viewer')).toBeTruthy();
    expect((screen.getByLabelText('Failsafe after') as HTMLInputElement).disabled).toBe(true);
    expect(screen.queryByRole('button', { name: 'Save…' })).toBeNull();
  });

  it('focuses the field a problem link points at', async () => {
    renderEditor(robotDetail(), { path: '/teams/team-1/robots/robot-1/safety?field=safety.reverseDwellMs' });
    await waitFor(() => expect(document.activeElement).toBe(screen.getByLabelText('Reverse dwell')));
  });

  it('asks before leaving the robot with unsaved changes', async () => {
    const user = userEvent.setup();
    const { router } = renderEditor(robotDetail());
    const ramp = screen.getByLabelText('Ramp limit');
    await user.clear(ramp);
    await user.type(ramp, '6');
    await user.click(screen.getByRole('link', { name: 'Hilltop Rover Club' }));
    const dialog = await screen.findByRole('dialog', { name: 'Leave with unsaved changes?' });
    await user.click(within(dialog).getByRole('button', { name: 'Stay' }));
    expect(router.state.location.pathname).toBe('/teams/team-1/robots/robot-1/safety');
    await user.click(screen.getByRole('link', { name: 'Hilltop Rover Club' }));
    await user.click(
      within(await screen.findByRole('dialog', { name: 'Leave with unsaved changes?' })).getByRole('button', {
        name: 'Leave, keep the draft',
      }),
    );
    expect(await screen.findByText('Team page')).toBeTruthy();
    expect(localStorage.getItem('mixwright:draft:user-1:robot-1')).toContain('"rampPerSecond":6');
  });
});

describe('discarding the draft', () => {
  it('asks first, then goes back to the head revision', async () => {
    const user = userEvent.setup();
    renderEditor(robotDetail());
    const ramp = screen.getByLabelText('Ramp limit');
    await user.clear(ramp);
    await user.type(ramp, '6');
    await user.click(screen.getByRole('button', { name: 'Discard draft' }));
    const dialog = await screen.findByRole('dialog', { name: 'Discard the draft?' });
    await user.click(within(dialog).getByRole('button', { name: 'Discard the draft' }));
    expect((screen.getByLabelText('Ramp limit') as HTMLInputElement).value).toBe('4');
    expect(screen.getByText('No unsaved changes')).toBeTruthy();
    expect(localStorage.getItem('mixwright:draft:user-1:robot-1')).toBeNull();
  });
});
