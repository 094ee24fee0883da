import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter } from 'react-router';
import { describe, expect, it } from 'vitest';
import { RobotTable } from '@/features/robots/components/robot-table';
import type { RobotListItem } from '@shared/schemas/robots';

function robot(overrides: Partial<RobotListItem> & Pick<RobotListItem, 'id' | 'name'>): RobotListItem {
  return {
    teamId: 't1',
    createdAt: '2026-03-01T10:00:00.000Z',
    updatedAt: '2026-03-01T10:00:00.000Z',
    headRevision: 1,
    lastFlash: null,
    photoUrl: null,
    layout: 'differential',
    board: 'uno',
    problems: { errors: 0, warnings: 0 },
    ...overrides,
  };
}

const robots = [
  robot({
    id: 'a',
    name: 'Aisle Scout',
    layout: 'quad-mecanum',
    board: 'esp32-devkitc',
    headRevision: 3,
    problems: { errors: 2, warnings: 1 },
    lastFlash: { revisionNumber: 2, flashedAt: '2026-03-05T10:00:00.000Z' },
  }),
  robot({
    id: 'b',
    name: 'Bench Kiwi',
    layout: 'quad-omni-x',
    board: 'rp2040-pico',
    problems: { errors: 0, warnings: 4 },
  }),
  robot({
    id: 'c',
    name: 'Garden Hauler',
    headRevision: 5,
    lastFlash: { revisionNumber: 5, flashedAt: '2026-03-07T10:00:00.000Z' },
  }),
];

function renderTable() {
  render(
    <MemoryRouter>
      <RobotTable robots={robots} teamName="Larkspur" />
    </MemoryRouter>,
  );
  return userEvent.setup();
}

const names = () =>
  screen
    .getAllByRole('row')
    .slice(1)
    .map((row) => within(row).getAllByRole('cell')[0].textContent);

describe('the robot table', () => {
  it('lists robots by name with layout, board, head, flashed revision and problems', () => {
    renderTable();
    expect(names()).toEqual(['Aisle Scout', 'Bench Kiwi', 'Garden Hauler']);
    const first = screen.getAllByRole('row')[1];
    expect(first.textContent).toMatch(/Quad mecanum.*ESP32 DevKitC.*r3.*r2 · 5 Mar 2026behind head.*2 errors1 warning/);
    expect(within(first).getByRole('link', { name: 'Aisle Scout' }).getAttribute('href')).toBe('/robots/a');
  });

  it('sorts by open problems, worst first, from the column heading', async () => {
    const user = renderTable();
    await user.click(screen.getByRole('button', { name: /Open problems/ }));
    expect(names()).toEqual(['Aisle Scout', 'Bench Kiwi', 'Garden Hauler']);
    expect(screen.getByRole('columnheader', { name: /Open problems/ }).getAttribute('aria-sort')).toBe('descending');
    await user.click(screen.getByRole('button', { name: /Open problems/ }));
    expect(names()).toEqual(['Garden Hauler', 'Bench Kiwi', 'Aisle Scout']);
  });

  it('sorts by head revision, newest first', async () => {
    const user = renderTable();
    await user.click(screen.getByRole('button', { name: /Head/ }));
    expect(names()).toEqual(['Garden Hauler', 'Aisle Scout', 'Bench Kiwi']);
  });

  it('finds robots by board name', async () => {
    const user = renderTable();
    await user.type(screen.getByLabelText('Find'), 'pico');
    expect(names()).toEqual(['Bench Kiwi']);
    expect(screen.getByText('1 of 3 robots')).toBeTruthy();
  });

  it('shows only robots with errors, or only those whose flashed revision is behind', async () => {
    const user = renderTable();
    await user.selectOptions(screen.getByLabelText('Show'), 'errors');
    expect(names()).toEqual(['Aisle Scout']);
    await user.selectOptions(screen.getByLabelText('Show'), 'clean');
    expect(names()).toEqual(['Garden Hauler']);
    await user.selectOptions(screen.getByLabelText('Show'), 'behind');
    expect(names()).toEqual(['Aisle Scout']);
  });
});
