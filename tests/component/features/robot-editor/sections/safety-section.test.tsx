import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { SafetySection } from '@/features/robot-editor/sections/safety-section';
import { SAFETY_CAUTIONS } from '@shared/safety/cautions';
import { buildStarterConfig } from '@shared/starter';
import { renderSection } from './section-harness';

const starter = () => buildStarterConfig({ layout: 'differential', driver: 'pwm-in1-in2-stby' });

describe('the safety section', () => {
  it('always shows the cautions', () => {
    renderSection(SafetySection, starter());
    const cautions = screen.getByRole('complementary', { name: 'Before the wheels turn' });
    for (const caution of SAFETY_CAUTIONS) expect(within(cautions).getByText(caution)).toBeTruthy();
  });

  it('says how long the ramp takes from standstill to full', async () => {
    const user = userEvent.setup();
    renderSection(SafetySection, starter());
    const ramp = screen.getByLabelText('Ramp limit');
    await user.clear(ramp);
    await user.type(ramp, '2');
    expect(screen.getByText('Standstill to full in 0.50 s')).toBeTruthy();
  });

  it('names the fuse and the rule of thumb it comes from', () => {
    renderSection(SafetySection, starter());
    expect(screen.getByText(/the 125 % continuous-load rule/)).toBeTruthy();
    // The starter's two motors stall at 1 A: they run at about 1 A together; 1.25 × 1 A = 1.25 A, so the next blade fuse is 2 A.
    expect(screen.getByText('2 A blade fuse')).toBeTruthy();
  });

  it('warns when a motor stalls above the driver’s peak rating', async () => {
    const user = userEvent.setup();
    renderSection(SafetySection, {
      ...starter(),
      motors: starter().motors.map((m) => ({ ...m, stallCurrentA: 5 })),
      power: { ...starter().power, chemistry: 'lipo', cells: 2 },
    });
    expect(screen.getByText(/stalls at 5 A, above Driver 1’s 3\.2 A peak/)).toBeTruthy();
    await user.clear(screen.getByLabelText('Cells in series'));
    await user.type(screen.getByLabelText('Cells in series'), '3');
    expect(screen.getByText(/Pack voltage 9 V empty, 11.1 V nominal, 12.6 V full/)).toBeTruthy();
  });

  it('explains the cell count in the way packs of the chosen chemistry are named', async () => {
    const user = userEvent.setup();
    renderSection(SafetySection, { ...starter(), power: { ...starter().power, chemistry: 'nimh', cells: 5 } });
    expect(screen.getByText('A 6 V pack has 5')).toBeTruthy();
    await user.selectOptions(screen.getByLabelText('Chemistry'), 'lipo');
    expect(screen.getByText('A 2S pack has 2')).toBeTruthy();
  });
});
