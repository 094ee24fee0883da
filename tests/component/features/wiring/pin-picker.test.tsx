import { fireEvent, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { findPin, getBoard } from '@shared/boards/boards';
import { buildConfig, withPins } from '../../../fixtures/robot-config-factory';
import { pickerFor, renderWiring, roleRow } from './render-wiring';

const optionValues = (group: HTMLOptGroupElement) => [...group.querySelectorAll('option')].map((o) => o.value);

describe('the pin picker', () => {
  it('offers the pins that suit a PWM role first and every other pin after, each with its reason', () => {
    const { container } = renderWiring(buildConfig({ board: 'uno', driver: 'pwm-dir', source: 'ppm' }));
    const select = pickerFor(container, 'driver:0:a.pwm');
    const [suits, others] = [...select.querySelectorAll('optgroup')];
    expect(suits.label).toBe('Suits this role');
    expect(others.label).toBe('Other pins — will show a problem');
    const uno = getBoard('uno');
    // The Uno's PWM pins (Arduino analogWrite reference: 3, 5, 6, 9, 10, 11), none of the others.
    expect(optionValues(suits).sort()).toEqual(['D10', 'D11', 'D3', 'D5', 'D6', 'D9']);
    expect(optionValues(suits).every((id) => findPin(uno, id)?.pwm)).toBe(true);
    expect(within(others).getByRole('option', { name: /^D2 — has no PWM$/ })).toBeTruthy();
    expect(optionValues(others)).toHaveLength(uno.pins.length - 6);
  });

  it('shows the whole text of the chosen pin on hover, however narrow the list', () => {
    const { container } = renderWiring(buildConfig({ board: 'uno', driver: 'pwm-dir', source: 'ppm' }));
    const select = pickerFor(container, 'driver:0:a.pwm');
    fireEvent.change(select, { target: { value: 'D2' } });
    expect(pickerFor(container, 'driver:0:a.pwm').title).toBe(select.selectedOptions[0].textContent);
    expect(select.title).toMatch(/^D2 — has no PWM$/);
  });

  it('puts a plain PWM pin first and keeps pins with scarce abilities for last', () => {
    const { container } = renderWiring(buildConfig({ board: 'uno', driver: 'pwm-dir', source: 'rc-pwm' }));
    const suits = optionValues(pickerFor(container, 'driver:0:a.pwm').querySelector('optgroup')!);
    // D9 has PWM and nothing else scarce; D3 is also external interrupt 1 (one of the Uno's
    // two, Arduino attachInterrupt reference), which a receiver may need.
    expect(suits[0]).toBe('D9');
    expect(suits.at(-1)).toBe('D3');
  });

  it('keeps the USB serial pins out of the suitable ones while diagnostics use the port', () => {
    const { container } = renderWiring(buildConfig({ board: 'uno', driver: 'pwm-dir', source: 'ppm' }));
    const [suits, others] = [...pickerFor(container, 'driver:0:a.dir').querySelectorAll('optgroup')];
    expect(optionValues(suits)).not.toContain('D0');
    expect(within(others).getByRole('option', { name: /^D0 — carries the USB serial port/ })).toBeTruthy();
  });

  it('lists a pin the board does not have, so the stored value stays visible', () => {
    const config = withPins(buildConfig({ board: 'uno', driver: 'pwm-dir', source: 'ppm' }), {
      'Driver 1/a.pwm': 'GPIO25',
    });
    const { container } = renderWiring(config);
    const select = pickerFor(container, 'driver:0:a.pwm');
    expect(select.value).toBe('GPIO25');
    expect(
      within(roleRow(container, 'driver:0:a.pwm')).getByText(/GPIO25 \(for Driver 1 A PWM\) is not a pin of the Uno/),
    ).toBeTruthy();
  });

  it('writes the chosen pin into the draft and lets a viewer only look', () => {
    const config = buildConfig({ board: 'nano', driver: 'pwm-dir', source: 'ppm' });
    const edit = renderWiring(config);
    fireEvent.change(pickerFor(edit.container, 'driver:0:a.pwm'), { target: { value: 'D9' } });
    expect(edit.config().wiring.drivers[0].pins['a.pwm']).toEqual({ pin: 'D9', locked: false });
    edit.unmount();
    const view = renderWiring(config, { canEdit: false });
    expect(pickerFor(view.container, 'driver:0:a.pwm').disabled).toBe(true);
  });
});
