import { fireEvent, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { checkPinPlan } from '@shared/pins/check-pins';
import { collectDemands } from '@shared/pins/pin-demands';
import { buildConfig, withPins } from '../../../fixtures/robot-config-factory';
import { pickerFor, renderWiring } from './render-wiring';

describe('assigning free pins', () => {
  it('fills every role, keeps a locked pin where it is, and lists what changed', () => {
    // D6 is a legal but unusual choice (timer 0); the search would not pick it first.
    const config = withPins(
      buildConfig({ board: 'uno', driver: 'pwm-dir', source: 'ppm' }),
      { 'Driver 1/b.pwm': 'D6' },
      true,
    );
    const view = renderWiring(config);
    fireEvent.click(screen.getByRole('button', { name: 'Assign free pins' }));

    const next = view.config();
    expect(next.wiring.drivers[0].pins['b.pwm']).toEqual({ pin: 'D6', locked: true });
    expect(collectDemands(next).filter((d) => d.required && d.pin === null)).toEqual([]);
    expect(checkPinPlan(next).filter((p) => p.severity === 'error')).toEqual([]);
    expect(screen.getByText(/pins assigned/)).toBeTruthy();
    expect(screen.getByText(`Driver 1 A PWM: ${next.wiring.drivers[0].pins['a.pwm'].pin}`)).toBeTruthy();
    expect(screen.queryByText(/Driver 1 B PWM:/)).toBeNull();
  });

  it('puts the pins back with undo', () => {
    const config = buildConfig({ board: 'nano', driver: 'pwm-dir', source: 'ppm' });
    const view = renderWiring(config);
    fireEvent.click(screen.getByRole('button', { name: 'Assign free pins' }));
    expect(pickerFor(view.container, 'driver:0:a.pwm').value).not.toBe('');
    fireEvent.click(screen.getByRole('button', { name: 'Undo assignment' }));
    expect(view.config()).toEqual(config);
    expect(pickerFor(view.container, 'driver:0:a.pwm').value).toBe('');
    expect(screen.queryByRole('button', { name: 'Undo assignment' })).toBeNull();
  });

  it('says in one sentence why no plan exists and changes nothing', () => {
    // Eight PWM inputs (four dual half-bridges) on the Uno's six PWM pins.
    const config = buildConfig({ board: 'uno', layout: 'quad-mecanum', driver: 'dual-pwm', source: 'ppm' });
    const view = renderWiring(config);
    fireEvent.click(screen.getByRole('button', { name: 'Assign free pins' }));
    expect(screen.getByRole('alert').textContent).toBe(
      'No pins were changed. The Uno has 6 PWM pins, this layout needs 8.',
    );
    expect(view.config()).toBe(config);
  });
});
