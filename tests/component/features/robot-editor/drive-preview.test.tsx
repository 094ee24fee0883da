import { act, fireEvent, render, screen, waitFor } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { driveStep } from '@shared/kinematics/drive-step';
import type { Sticks } from '@shared/kinematics/mixing';
import type { DriveLayoutId } from '@shared/schemas/ids';
import { DrivePreview } from '@/features/robot-editor/components/drive-preview';
import { makeConfig } from '../../../factories/engine';

/** Each motor bar's value in percent, as the page shows it. */
const bars = () => screen.getAllByRole('meter').map((m) => Number(m.getAttribute('aria-valuenow')));

/** What the engine's own step gives, in percent, for the preview's default (highest) rate switch position. */
function expectedPercent(layout: DriveLayoutId, sticks: Sticks, change?: Parameters<typeof makeConfig>[1]): number[] {
  const config = makeConfig(layout, change);
  const step = driveStep(config, sticks, { ratePosition: config.controls.rateSwitch.rates.length - 1 });
  return step.outputs.map((v) => Math.round(v * 100) + 0);
}

describe('the drive preview', () => {
  it('shows one bar per motor, all at rest to begin with', () => {
    render(<DrivePreview config={makeConfig('trio-omni')} />);
    expect(bars()).toEqual([0, 0, 0]);
  });

  it('shows the engine’s commands while the floor view is driven with W and E', async () => {
    const change = (c: ReturnType<typeof makeConfig>) => {
      c.motors[1].startThreshold = 0.2;
      c.safety.outputLimitPercent = 80;
    };
    render(<DrivePreview config={makeConfig('quad-mecanum', change)} defaultRamp={false} />);
    const floor = screen.getByRole('application', { name: /drive with the keyboard/i });
    act(() => floor.focus());
    fireEvent.keyDown(floor, { key: 'w' });
    fireEvent.keyDown(floor, { key: 'e' });
    const expected = expectedPercent('quad-mecanum', { forward: 1, strafe: 0, yaw: 1 }, change);
    expect(expected.some((v) => v !== 0)).toBe(true);
    await waitFor(() => expect(bars()).toEqual(expected));
  });

  it('brings every motor back to rest when the keys are let go', async () => {
    render(<DrivePreview config={makeConfig('differential')} defaultRamp={false} />);
    const floor = screen.getByRole('application');
    fireEvent.keyDown(floor, { key: 'ArrowUp' });
    await waitFor(() => expect(bars()).toEqual(expectedPercent('differential', { forward: 1, strafe: 0, yaw: 0 })));
    fireEvent.keyUp(floor, { key: 'ArrowUp' });
    await waitFor(() => expect(bars()).toEqual([0, 0]));
  });

  it('drives from the right stick with the keyboard as well', async () => {
    render(<DrivePreview config={makeConfig('quad-omni-x')} defaultRamp={false} />);
    const stick = screen.getByRole('slider', { name: /right stick/i });
    fireEvent.keyDown(stick, { key: 'ArrowRight', shiftKey: true });
    await waitFor(() => expect(bars()).toEqual(expectedPercent('quad-omni-x', { forward: 0, strafe: 0.5, yaw: 0 })));
  });
});
