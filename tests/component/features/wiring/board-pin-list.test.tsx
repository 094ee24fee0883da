import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { unoPlan } from '../../../fixtures/pin-plans';
import { renderWiring, roleRow } from './render-wiring';

const pinRow = (container: HTMLElement, id: string) => container.querySelector<HTMLElement>(`li[data-pin="${id}"]`)!;

describe('the board’s pin list', () => {
  it('shows each pin’s code, abilities and the role on it', () => {
    const { container } = renderWiring(unoPlan());
    const d9 = pinRow(container, 'D9');
    expect(within(d9).getByText('code 9')).toBeTruthy();
    expect(within(d9).getByText('“~9” ·')).toBeTruthy();
    // Arduino AVR core, pins_arduino.h: pin 9 is timer 1 output A.
    expect(within(d9).getByTitle(/PWM on timer 1, output A, 490.2 Hz by default/)).toBeTruthy();
    expect(within(d9).getByRole('button', { name: '→ Driver 1 · A PWM' })).toBeTruthy();
    expect(within(pinRow(container, 'D0')).getByText('USB serial')).toBeTruthy();
  });

  it('lights the role on a pin when the pin is pointed at, and the pin when the role is', () => {
    const { container } = renderWiring(unoPlan());
    fireEvent.mouseEnter(pinRow(container, 'D9'));
    expect(roleRow(container, 'driver:0:a.pwm').dataset.lit).toBe('true');
    expect(roleRow(container, 'driver:0:a.dir').dataset.lit).toBeUndefined();
    fireEvent.mouseLeave(pinRow(container, 'D9'));
    fireEvent.mouseEnter(roleRow(container, 'driver:0:b.dir'));
    expect(pinRow(container, 'D7').dataset.lit).toBe('true');
  });

  it('is one tab stop, with the arrow keys moving between pins', () => {
    const { container } = renderWiring(unoPlan());
    const rows = [...container.querySelectorAll<HTMLElement>('li[data-pin]')];
    expect(rows.filter((r) => r.tabIndex === 0)).toHaveLength(1);
    rows[0].focus();
    fireEvent.keyDown(rows[0], { key: 'ArrowDown' });
    expect(document.activeElement).toBe(rows[1]);
    fireEvent.keyDown(rows[1], { key: 'End' });
    expect(document.activeElement).toBe(rows.at(-1));
  });

  it('narrows to the pins in use', () => {
    const { container } = renderWiring(unoPlan());
    fireEvent.click(screen.getByRole('radio', { name: 'In use' }));
    expect([...container.querySelectorAll<HTMLElement>('li[data-pin]')].map((r) => r.dataset.pin)).toEqual([
      'D2',
      'D7',
      'D8',
      'D9',
      'D10',
      'D13',
    ]);
  });
});
