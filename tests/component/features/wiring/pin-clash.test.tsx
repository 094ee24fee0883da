import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { unoPlan } from '../../../fixtures/pin-plans';
import { pickerFor, renderWiring, roleRow } from './render-wiring';

describe('a pin clash in the Wiring section', () => {
  it('shows the clash beside both roles and clears it when another pin is chosen', () => {
    const { container } = renderWiring(unoPlan());
    expect(screen.getByText(/No wiring problems/)).toBeTruthy();

    fireEvent.change(pickerFor(container, 'driver:0:a.dir'), { target: { value: 'D9' } });
    const clash = /D9 is used for Driver 1 A PWM and Driver 1 A Direction/;
    expect(within(roleRow(container, 'driver:0:a.pwm')).getByText(clash)).toBeTruthy();
    expect(within(roleRow(container, 'driver:0:a.dir')).getByText(clash)).toBeTruthy();
    expect(pickerFor(container, 'driver:0:a.dir').getAttribute('aria-invalid')).toBe('true');
    expect(within(screen.getByRole('region', { name: /Wiring problems/ })).getByText(clash)).toBeTruthy();

    fireEvent.change(pickerFor(container, 'driver:0:a.dir'), { target: { value: 'D4' } });
    expect(screen.queryByText(clash)).toBeNull();
    expect(screen.getByText(/No wiring problems/)).toBeTruthy();
  });

  it('marks the clashing pin in the board’s pin list, in words and not by colour alone', () => {
    const { container } = renderWiring(unoPlan());
    fireEvent.change(pickerFor(container, 'driver:0:a.dir'), { target: { value: 'D9' } });
    const pinRow = container.querySelector<HTMLElement>('[data-pin="D9"]')!;
    expect(pinRow.dataset.state).toBe('error');
    expect(within(pinRow).getByRole('img', { name: 'Error' })).toBeTruthy();
    expect(within(pinRow).getByText(/D9 is used for Driver 1 A PWM and Driver 1 A Direction/)).toBeTruthy();
  });
});
