import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { ChassisSection } from '@/features/robot-editor/sections/chassis-section';
import { buildStarterConfig } from '@shared/starter';
import { renderSection } from './section-harness';

const mecanum = () => buildStarterConfig({ layout: 'quad-mecanum', board: 'esp32-devkitc' });

describe('the chassis section', () => {
  it('builds the wheel table again when a layout parameter changes', async () => {
    const user = userEvent.setup();
    const { latest } = renderSection(ChassisSection, mecanum());
    const wheelbase = screen.getByLabelText('Wheelbase (front to rear axle)');
    await user.clear(wheelbase);
    await user.type(wheelbase, '240');
    expect(latest().chassis.params.wheelbaseMm).toBe(240);
    expect(latest().chassis.wheels.map((w) => w.xMm)).toEqual([120, 120, -120, -120]);
    const table = screen.getByRole('table', { name: 'Wheel table' });
    expect(within(table).getAllByText('120')).toHaveLength(2);
  });

  it('shows the reason beside a parameter out of range and keeps the wheels', async () => {
    const user = userEvent.setup();
    const { latest } = renderSection(ChassisSection, mecanum());
    const wheelbase = screen.getByLabelText('Wheelbase (front to rear axle)');
    await user.clear(wheelbase);
    await user.type(wheelbase, '5');
    expect(screen.getByText('✕ Must be at least 20 mm')).toBeTruthy();
    expect(latest().chassis.wheels[0].xMm).toBe(80);
  });

  it('keeps the table to edit when switching to a custom wheel table, and adds a wheel', async () => {
    const user = userEvent.setup();
    const { latest } = renderSection(ChassisSection, mecanum());
    await user.selectOptions(screen.getByLabelText('Layout'), 'custom');
    expect(latest().chassis.wheels).toEqual(mecanum().chassis.wheels);
    const radius = screen.getByLabelText('Front left: radius in mm');
    await user.clear(radius);
    await user.type(radius, '45');
    expect(latest().chassis.wheels[0].radiusMm).toBe(45);
    await user.click(screen.getByRole('button', { name: 'Add wheel' }));
    expect(latest().chassis.wheels).toHaveLength(5);
    expect(screen.getByLabelText('Name of wheel 5')).toBeTruthy();
  });

  it('lists a bad cell’s reason under the table', async () => {
    const user = userEvent.setup();
    renderSection(ChassisSection, mecanum());
    await user.selectOptions(screen.getByLabelText('Layout'), 'custom');
    const radius = screen.getByLabelText('Rear left: radius in mm');
    await user.clear(radius);
    await user.type(radius, '0');
    expect(screen.getByText('✕ Wheel 4 (Rear left), radius: Radius must be more than 0 mm')).toBeTruthy();
    expect(radius.getAttribute('aria-invalid')).toBe('true');
  });

  it('renames a motor on its wheel when the name field is left', async () => {
    const user = userEvent.setup();
    const { latest } = renderSection(ChassisSection, mecanum());
    const name = screen.getByLabelText('Name of motor Rear right');
    await user.clear(name);
    await user.type(name, 'Back right');
    await user.tab();
    expect(latest().motors[2].name).toBe('Back right');
    expect(latest().chassis.wheels[2].motor).toBe('Back right');
    expect(latest().wiring.drivers.flatMap((d) => d.motors)).toContain('Back right');
  });

  it('turns a motor round with the reversed box, and the mixing follows', async () => {
    const user = userEvent.setup();
    const { latest } = renderSection(ChassisSection, mecanum());
    await user.click(screen.getByLabelText('Front right reversed'));
    expect(latest().chassis.wheels[1].reversed).toBe(true);
  });

  it('lets a viewer look without changing anything', () => {
    renderSection(ChassisSection, mecanum(), { canEdit: false });
    expect((screen.getByLabelText('Layout') as HTMLSelectElement).disabled).toBe(true);
    expect((screen.getByLabelText('Front right reversed') as HTMLInputElement).disabled).toBe(true);
    expect(screen.getByRole('table', { name: 'Motor command per full stick' })).toBeTruthy();
  });
});
