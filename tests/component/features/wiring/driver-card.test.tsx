import { fireEvent, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { unoPlan } from '../../../fixtures/pin-plans';
import { buildConfig } from '../../../fixtures/robot-config-factory';
import { pickerFor, renderWiring } from './render-wiring';

const card = (name: string) => screen.getByRole('article', { name });

describe('a driver card', () => {
  it('sets the suggested quiet frequency and shows what the pins then run at', () => {
    const view = renderWiring(unoPlan());
    const driver = card('Driver 1');
    expect(within(driver).getByText(/Set 20 kHz: above hearing/)).toBeTruthy();
    fireEvent.click(within(driver).getByRole('button', { name: 'Use 20 kHz' }));
    expect(view.config().wiring.drivers[0].pwmFrequencyHz).toBe(20000);
    // ATmega328P datasheet, 16-bit phase-correct PWM: 16 MHz / (2 × 1 × 400) = 20 kHz on D9 and D10.
    expect(within(driver).getByText(/D9, D10 at 20 kHz \(16 MHz \/ \(2 × 1 × 400\) = 20 kHz\)/)).toBeTruthy();
    fireEvent.click(within(driver).getByRole('radio', { name: 'Board default' }));
    expect(view.config().wiring.drivers[0].pwmFrequencyHz).toBeNull();
  });

  it('says what brake and coast do, and offers only what the kind can do', () => {
    renderWiring(unoPlan());
    const driver = card('Driver 1');
    expect(within(driver).getByText(/the motor’s leads are shorted/)).toBeTruthy();
    // A PWM + direction module has no way to let the motor go.
    expect(within(driver).getByRole('radio', { name: /Coast/ })).toHaveProperty('disabled', true);
  });

  it('names the motor supply range once, from the ratings’ source when it states one', () => {
    renderWiring(unoPlan({ driver: 'pwm-in1-in2-stby' }));
    const note = within(card('Driver 1')).getByText(/Leave empty for the kind’s typical figures/).textContent!;
    // TB6612FNG datasheet, absolute maximum ratings: VM 2.5–13.5 V, stated by the source itself.
    expect(note.match(/2\.5–13\.5 V/g)).toHaveLength(1);
    expect(note).not.toContain('motor supply');
  });

  it('adds the motor supply range when the ratings’ source does not state it', () => {
    renderWiring(unoPlan({ driver: 'pwm-dir' }));
    expect(within(card('Driver 1')).getByText(/Leave empty for the kind’s typical figures/).textContent).toContain(
      'motor supply 6–30 V',
    );
  });

  it('keeps shared roles’ pins when the kind changes and says what it cleared', () => {
    const view = renderWiring(unoPlan());
    fireEvent.change(within(card('Driver 1')).getByLabelText('Kind'), { target: { value: 'pwm-in1-in2-stby' } });
    expect(screen.getByText(/pins on roles both kinds share stay; cleared D8, D7/)).toBeTruthy();
    expect(pickerFor(view.container, 'driver:0:a.pwm').value).toBe('D9');
    expect(pickerFor(view.container, 'driver:0:stby').value).toBe('');
  });

  it('adds a driver only for motors that have none, and removes one', () => {
    const view = renderWiring(buildConfig({ layout: 'h-drive', driver: 'pwm-dir', board: 'mega2560' }));
    expect(screen.getByRole('button', { name: 'Add driver' })).toHaveProperty('disabled', true);
    fireEvent.click(screen.getByRole('button', { name: 'Remove Driver 2' }));
    expect(screen.getByText('Not on a driver yet: “Cross”.')).toBeTruthy();
    fireEvent.click(screen.getByRole('button', { name: 'Add driver' }));
    expect(view.config().wiring.drivers.map((d) => d.motors)).toEqual([['Left', 'Right'], ['Cross']]);
  });
});
