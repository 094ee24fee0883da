import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { ControlsSection } from '@/features/robot-editor/sections/controls-section';
import { buildStarterConfig } from '@shared/starter';
import { renderSection } from './section-harness';

const starter = (input: 'rc-pwm' | 'nrf24' = 'rc-pwm') => buildStarterConfig({ layout: 'quad-mecanum', input });

describe('the controls section', () => {
  it('stores deadband, expo and rate typed in percent as fractions', async () => {
    const user = userEvent.setup();
    const { latest } = renderSection(ControlsSection, starter());
    const deadbands = screen.getAllByLabelText('Deadband');
    await user.clear(deadbands[2]);
    await user.type(deadbands[2], '10');
    expect(latest().controls.axes.yaw.deadband).toBeCloseTo(0.1, 10);
  });

  it('maps a stick to another channel from the table', async () => {
    const user = userEvent.setup();
    const { latest } = renderSection(ControlsSection, starter());
    const forward = screen.getByRole('region', { name: /^Forward/ });
    await user.selectOptions(within(forward).getByLabelText('Channel'), '5 · Rate switch');
    expect(latest().controls.axes.forward.channel).toBe(5);
  });

  it('adds the next free channel with the source’s calibration', async () => {
    const user = userEvent.setup();
    const { latest } = renderSection(ControlsSection, starter());
    await user.click(screen.getByRole('button', { name: 'Add channel' }));
    expect(latest().controls.channels.find((c) => c.number === 3)).toMatchObject({
      low: 1000,
      centre: 1500,
      high: 2000,
    });
  });

  it('renumbers a channel when its number is left, and the stick using it follows', async () => {
    const user = userEvent.setup();
    const config = starter();
    const { latest } = renderSection(ControlsSection, config);
    const used = config.controls.axes.forward.channel!;
    const number = screen.getByLabelText(`Number of channel ${used}`);
    await user.clear(number);
    await user.type(number, '9');
    await user.tab();
    expect(latest().controls.channels.map((c) => c.number)).toContain(9);
    expect(latest().controls.axes.forward.channel).toBe(9);
  });

  it('refuses a channel number already in the table, says why under it and puts the old number back', async () => {
    const user = userEvent.setup();
    const [first, second] = starter().controls.channels;
    renderSection(ControlsSection, starter());
    const number = screen.getByLabelText(`Number of channel ${first.number}`) as HTMLInputElement;
    await user.clear(number);
    await user.type(number, `${second.number}{Enter}`);
    expect(screen.getByRole('alert').textContent).toBe(`✕ Channel ${second.number} is already in the table`);
    expect(number.value).toBe(String(first.number));
  });

  it('removes a channel with its row’s remove button', async () => {
    const user = userEvent.setup();
    const [first] = starter().controls.channels;
    const { latest } = renderSection(ControlsSection, starter());
    await user.click(screen.getByRole('button', { name: `Remove channel ${first.number}` }));
    expect(latest().controls.channels.map((c) => c.number)).not.toContain(first.number);
  });

  it('refuses a calibration whose centre is not between the ends, under the table', async () => {
    const user = userEvent.setup();
    renderSection(ControlsSection, starter());
    const centre = screen.getByLabelText('Channel 2 centre in µs');
    await user.clear(centre);
    await user.type(centre, '2100');
    expect(screen.getByText('✕ Channel 2, centre: Low end, centre and high end must increase')).toBeTruthy();
  });

  it('offers the clip setting as the worse choice', () => {
    renderSection(ControlsSection, starter());
    expect(screen.getByText(/Worse: the clipped motor falls behind/)).toBeTruthy();
    expect((screen.getByRole('radio', { name: /Scale all motors down together/ }) as HTMLInputElement).checked).toBe(
      true,
    );
  });

  it('shows the link settings only for the home-made link, with a new random address on request', async () => {
    const user = userEvent.setup();
    const { unmount } = renderSection(ControlsSection, starter('rc-pwm'));
    expect(screen.queryByText('2.4 GHz link')).toBeNull();
    unmount();
    const { latest } = renderSection(ControlsSection, starter('nrf24'));
    expect(screen.getByText('2476 MHz')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'New random address' }));
    expect(latest().controls.link.address).toMatch(/^[0-9A-F]{10}$/);
    expect(latest().controls.link.address).not.toBe('4D57520001');
  });

  it('resets every calibration when the input source changes', async () => {
    const user = userEvent.setup();
    const { latest } = renderSection(ControlsSection, starter());
    await user.selectOptions(screen.getByLabelText('Input source'), 'sbus');
    expect(latest().controls.channels.every((c) => c.low === 172 && c.high === 1811)).toBe(true);
    expect(screen.getAllByText(/\(counts\)/).length).toBe(3);
  });
});
