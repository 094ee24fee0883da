import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { CommissioningSection } from '@/features/robot-editor/sections/commissioning-section';
import { buildStarterConfig } from '@shared/starter';
import { renderSection } from './section-harness';

const mecanum = () => buildStarterConfig({ layout: 'quad-mecanum', driver: 'pwm-in1-in2-stby' });

type User = ReturnType<typeof userEvent.setup>;

/** Answers the current bench step: which wheels turned, and which way. */
async function answer(user: User, turned: 'own' | string, direction: 'Yes, as shown' | 'No, the other way') {
  if (turned === 'own') await user.click(screen.getByRole('radio', { name: /The highlighted wheel/ }));
  else {
    await user.click(screen.getByRole('radio', { name: /The wheels of another motor/ }));
    await user.selectOptions(
      screen.getByLabelText("Which motor's wheels turned"),
      screen.getByRole('option', { name: new RegExp(`^${turned} `) }),
    );
  }
  await user.click(screen.getByRole('radio', { name: direction }));
}

describe('the commissioning check', () => {
  it('follows the bench test’s motor order and console line', () => {
    renderSection(CommissioningSection, mecanum());
    const order = screen.getByRole('list', { name: 'Motors in bench-test order' });
    expect(
      within(order)
        .getAllByRole('button')
        .map((b) => b.textContent),
    ).toEqual([
      '1. Front leftnot checked yet',
      '2. Front rightnot checked yet',
      '3. Rear rightnot checked yet',
      '4. Rear leftnot checked yet',
    ]);
    expect(screen.getByText('bench motor 1/4 "Front left" forward')).toBeTruthy();
  });

  it('flips a motor that turned the wrong way and offers to save it with a message', async () => {
    const user = userEvent.setup();
    const { latest, requestSave } = renderSection(CommissioningSection, mecanum());
    await answer(user, 'own', 'Yes, as shown');
    await user.click(screen.getByRole('button', { name: 'Next motor' }));
    await answer(user, 'own', 'No, the other way');
    await user.click(screen.getByRole('button', { name: 'Next motor' }));
    await answer(user, 'own', 'Yes, as shown');
    await user.click(screen.getByRole('button', { name: 'Next motor' }));
    await answer(user, 'own', 'Yes, as shown');
    expect(screen.getByText('Flipped Front right')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Apply and save as a revision…' }));
    expect(latest().chassis.wheels.find((w) => w.name === 'Front right')?.reversed).toBe(true);
    expect(requestSave).toHaveBeenCalledWith('Commissioning: flipped Front right');
  });

  it('swaps two motors whose wires are crossed', async () => {
    const user = userEvent.setup();
    const { latest, requestSave } = renderSection(CommissioningSection, mecanum());
    await answer(user, 'Rear left', 'Yes, as shown');
    await user.click(screen.getByRole('button', { name: 'Next motor' }));
    await answer(user, 'own', 'Yes, as shown');
    await user.click(screen.getByRole('button', { name: 'Next motor' }));
    await answer(user, 'own', 'Yes, as shown');
    await user.click(screen.getByRole('button', { name: 'Next motor' }));
    await answer(user, 'Front left', 'Yes, as shown');
    await user.click(screen.getByRole('button', { name: 'Apply to the draft only' }));
    expect(latest().wiring.drivers.flatMap((d) => d.motors)).toEqual([
      'Rear left',
      'Front right',
      'Rear right',
      'Front left',
    ]);
    expect(requestSave).not.toHaveBeenCalled();
    expect(screen.getByText('Put into the draft: swapped Front left and Rear left.')).toBeTruthy();
  });

  it('says the configuration cannot fix a motor that did not turn', async () => {
    const user = userEvent.setup();
    renderSection(CommissioningSection, mecanum());
    await user.click(screen.getByRole('radio', { name: 'Nothing turned' }));
    expect(screen.getByText(/not fixed by the configuration/)).toBeTruthy();
  });

  it('shows every wheel’s expected direction for each stick', () => {
    renderSection(CommissioningSection, mecanum());
    const table = screen.getByRole('table', { name: /Expected direction of each wheel/ });
    expect(within(table).getAllByRole('row')).toHaveLength(5);
    expect(screen.getByText('Mecanum rollers, seen from above')).toBeTruthy();
  });
});
