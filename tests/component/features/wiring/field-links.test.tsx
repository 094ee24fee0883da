import { screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import { WiringSection } from '@/features/wiring/components/wiring-section';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { unoPlan } from '../../../fixtures/pin-plans';
import { revisionDetail, renderEditor, robotDetail } from '../robot-editor/shell/render-editor';
import { pickerFor } from './render-wiring';

beforeEach(() => localStorage.clear());

/** The whole editor with the Wiring section, opened at `path` (below the robot). */
function openEditor(config: RobotConfig, path: string) {
  return renderEditor(robotDetail({ head: revisionDetail(3, config) }), {
    sections: { wiring: WiringSection },
    path: `/teams/team-1/robots/robot-1/${path}`,
  });
}

const withRemote = () => unoPlan({ source: 'nrf24', remoteBoard: 'nano' });

describe('links to a field of the Wiring section', () => {
  it.each([
    ['a driver role’s pin', unoPlan, 'wiring.drivers.0.pins.a.pwm.pin', 'driver:0:a.pwm'],
    ['a driver role, by its assignment', unoPlan, 'wiring.drivers.0.pins.b.dir', 'driver:0:b.dir'],
    ['the receiver’s pin', unoPlan, 'wiring.inputPins.ppm.pin', 'input:ppm'],
    ['the status LED', unoPlan, 'wiring.statusLed', 'status-led'],
    ['the bench-test switch', unoPlan, 'wiring.benchTestPin.pin', 'bench-test'],
    ['a pin of the handheld remote', withRemote, 'controls.link.remotePins.csn.pin', 'remote:csn'],
  ])('focus the exact pin picker for %s', async (_what, config, field, roleKey) => {
    const { container } = openEditor(config(), `wiring?field=${encodeURIComponent(field)}`);
    await waitFor(() => expect(document.activeElement).toBe(pickerFor(container, roleKey)));
  });

  it('lead from the list of every problem to the pin picker the problem is about', async () => {
    const user = userEvent.setup();
    const { container, router } = openEditor(unoPlan({}, { 'Driver 1/b.pwm': null }), 'problems');
    const item = screen.getByText(/Driver 1 B PWM has no pin/).closest('li')!;
    await user.click(within(item).getByRole('link', { name: 'Show field' }));
    await waitFor(() => expect(document.activeElement).toBe(pickerFor(container, 'driver:0:b.pwm')));
    expect(router.state.location.pathname).toBe('/teams/team-1/robots/robot-1/wiring');
  });

  it('lead from the list of every problem to a pin of the handheld remote', async () => {
    const user = userEvent.setup();
    const config = withRemote();
    config.controls.link.remotePins = { ...config.controls.link.remotePins, ce: { pin: null, locked: false } };
    const { container } = openEditor(config, 'problems');
    const item = screen.getByText(/Remote transceiver CE has no pin/i).closest('li')!;
    await user.click(within(item).getByRole('link', { name: 'Show field' }));
    await waitFor(() => expect(document.activeElement).toBe(pickerFor(container, 'remote:ce')));
  });

  it('lead from the section’s own problem list to the role’s pin picker', async () => {
    const user = userEvent.setup();
    const { container } = openEditor(unoPlan({}, { 'Driver 1/b.pwm': null }), 'wiring');
    await user.click(screen.getByRole('button', { name: /Driver 1 B PWM has no pin/ }));
    await waitFor(() => expect(document.activeElement).toBe(pickerFor(container, 'driver:0:b.pwm')));
  });

  it('lead from a pin in the board’s list to the role that holds it', async () => {
    const user = userEvent.setup();
    const { container } = openEditor(unoPlan(), 'wiring');
    const d9 = container.querySelector<HTMLElement>('li[data-pin="D9"]')!;
    await user.click(within(d9).getByRole('button', { name: '→ Driver 1 · A PWM' }));
    await waitFor(() => expect(document.activeElement).toBe(pickerFor(container, 'driver:0:a.pwm')));
  });
});
