import { fireEvent, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { esp32Plan, unoPlan } from '../../../fixtures/pin-plans';
import { pickerFor, renderWiring } from './render-wiring';

describe('changing the board', () => {
  it('keeps every role, clears the pins the new board lacks and says which', () => {
    const view = renderWiring(esp32Plan());
    fireEvent.change(screen.getByLabelText('Board'), { target: { value: 'uno' } });
    const message = screen.getByText(/The robot is now on the Uno/).textContent!;
    for (const cleared of ['GPIO25 (Driver 1 A PWM)', 'GPIO35 (PPM signal)', 'GPIO13 (status LED)'])
      expect(message).toContain(cleared);
    expect(message).toContain('Every role is kept');
    const next = view.config();
    expect(next.wiring.board).toBe('uno');
    expect(Object.keys(next.wiring.drivers[0].pins).sort()).toEqual(['a.dir', 'a.pwm', 'b.dir', 'b.pwm']);
    expect(pickerFor(view.container, 'driver:0:a.pwm').value).toBe('');
  });

  it('keeps pins the new board also has', () => {
    const view = renderWiring(unoPlan());
    fireEvent.change(screen.getByLabelText('Board'), { target: { value: 'mega2560' } });
    expect(screen.getByText(/all 6 pins exist on this board too, so they stay/)).toBeTruthy();
    expect(pickerFor(view.container, 'driver:0:a.pwm').value).toBe('D9');
  });
});
