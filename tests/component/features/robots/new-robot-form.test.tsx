import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it, vi } from 'vitest';
import { NewRobotForm } from '@/features/robots/components/new-robot-form';
import { answerFetch, renderWithQuery } from '../../support/render';

const created = {
  id: 'r1',
  teamId: 't1',
  name: 'Moss Crawler',
  createdAt: '2026-03-01T10:00:00.000Z',
  headRevision: 1,
  updatedAt: '2026-03-01T10:00:00.000Z',
  lastFlash: null,
};

function renderForm() {
  const onCreated = vi.fn();
  renderWithQuery(<NewRobotForm teamId="t1" onCreated={onCreated} onCancel={() => {}} />);
  return { onCreated, user: userEvent.setup() };
}

describe('the new-robot form', () => {
  it('says up front that the pins of the chosen parts can be placed', () => {
    renderForm();
    expect(screen.getByRole('status').textContent).toContain('Every pin can be placed automatically');
  });

  it('says why the pins cannot be placed for parts that do not fit, before anything is created', async () => {
    const { user } = renderForm();
    await user.selectOptions(screen.getByLabelText('Board'), 'uno');
    await user.selectOptions(screen.getByLabelText('Input source'), 'sbus');
    expect(screen.getByRole('status').textContent).toMatch(
      /Pins cannot be placed automatically: The Uno’s only serial receive pin.*starts with its pins unassigned/,
    );
  });

  it('asks for a name and sends nothing without one', async () => {
    const { calls } = answerFetch(201, { robot: created });
    const { user } = renderForm();
    await user.click(screen.getByRole('button', { name: 'Create robot' }));
    expect(await screen.findByText('Give the robot a name')).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it('creates the robot from the starter layout with its pins placed', async () => {
    const { calls } = answerFetch(201, { robot: created });
    const { user, onCreated } = renderForm();
    await user.type(screen.getByLabelText('Robot name'), 'Moss Crawler');
    await user.selectOptions(screen.getByLabelText('Starter layout'), 'quad-mecanum');
    await user.click(screen.getByRole('button', { name: 'Create robot' }));
    await waitFor(() => expect(onCreated).toHaveBeenCalledWith(created));
    expect(calls[0].url).toBe('/api/teams/t1/robots');
    const body = JSON.parse(String(calls[0].init?.body));
    expect(body).toMatchObject({
      name: 'Moss Crawler',
      message: 'Started from the Quad mecanum starter layout; pins placed automatically',
      config: { name: 'Moss Crawler', chassis: { layout: 'quad-mecanum' } },
    });
    const pins = body.config.wiring.drivers.flatMap((d: { pins: Record<string, { pin: string | null }> }) =>
      Object.values(d.pins).map((p) => p.pin),
    );
    expect(pins.length).toBeGreaterThan(0);
    expect(pins.every((p: string | null) => p !== null)).toBe(true);
  });

  it('shows the server’s reason beside the name', async () => {
    answerFetch(400, {
      error: {
        code: 'validation_failed',
        message: 'Check the highlighted fields',
        fields: { name: 'At most 60 characters' },
      },
    });
    const { user } = renderForm();
    await user.type(screen.getByLabelText('Robot name'), 'Moss Crawler');
    await user.click(screen.getByRole('button', { name: 'Create robot' }));
    expect(await screen.findByText('At most 60 characters')).toBeTruthy();
  });
});
