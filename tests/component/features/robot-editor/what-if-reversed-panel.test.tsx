import { fireEvent, render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { whatIfReversed } from '@shared/kinematics/mixing';
import { WhatIfReversedPanel } from '@/features/robot-editor/components/what-if-reversed-panel';
import { makeConfig } from '../../../factories/engine';

describe('the what-if-reversed panel', () => {
  it('offers one toggle per motor, none pressed at first', () => {
    render(<WhatIfReversedPanel config={makeConfig('quad-mecanum')} />);
    const toggles = screen.getAllByRole('button');
    expect(toggles.map((t) => t.textContent?.replace(/^\W+/, ''))).toEqual([
      'Front left',
      'Front right',
      'Rear right',
      'Rear left',
    ]);
    expect(toggles.every((t) => t.getAttribute('aria-pressed') === 'false')).toBe(true);
  });

  it('shows the engine’s sentences for the motor pressed', () => {
    const config = makeConfig('trio-omni');
    render(<WhatIfReversedPanel config={config} />);
    fireEvent.click(screen.getByRole('button', { name: /Rear left/ }));
    expect(screen.getByRole('button', { name: /Rear left/ }).getAttribute('aria-pressed')).toBe('true');
    for (const c of whatIfReversed(config, 'Rear left').cases) expect(screen.getByText(c.sentence)).toBeTruthy();
  });

  it('turns the reversed motor’s wheel the other way in the drawing', () => {
    const config = makeConfig('differential');
    const { container } = render(<WhatIfReversedPanel config={config} defaultMotor="Right" />);
    const push = (name: string) =>
      container.querySelector(`[data-testid="command-${name}"]`)!.getAttribute('data-push');
    // Forward stick: both wheels ahead, but the reversed right motor turns its wheel back.
    expect([push('Left'), push('Right')]).toEqual(['1', '-1']);
    expect(container.querySelector('[data-testid="resulting-motion"]')).toBeTruthy();
  });

  it('lets a stick the layout ignores be seen but not chosen', () => {
    render(<WhatIfReversedPanel config={makeConfig('differential')} />);
    expect(screen.getByRole('radio', { name: 'Strafe stick' })).toHaveProperty('disabled', true);
  });
});
