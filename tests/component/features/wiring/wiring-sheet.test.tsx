import { render, screen, within } from '@testing-library/react';
import { MemoryRouter } from 'react-router';
import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTIONS } from '@shared/safety/cautions';
import { WiringSheet } from '@/features/wiring/components/wiring-sheet';
import { unoPlan } from '../../../fixtures/pin-plans';
import { revisionOf } from './render-wiring';

const cellsOf = (row: HTMLElement) =>
  within(row)
    .getAllByRole('cell')
    .map((c) => c.textContent?.trim());

function renderSheet(photoUrl?: string) {
  return render(
    <MemoryRouter>
      <WiringSheet
        robotName="Test robot"
        teamName="Quarry Lane Robotics"
        revision={revisionOf(unoPlan(), 5)}
        photoUrl={photoUrl}
        printedAt={new Date('2026-03-01T12:00:00Z')}
      />
    </MemoryRouter>,
  );
}

describe('the wiring sheet', () => {
  it('lists every used pin in the board’s order with its code and what connects to it', () => {
    renderSheet();
    const table = screen.getByRole('table', { name: 'Pins on the Uno' });
    const rows = within(table).getAllByRole('row').slice(1).map(cellsOf);
    expect(rows).toEqual([
      ['D2', '2', 'PPM signal', 'input, ext. interrupt'],
      ['D7', '7', 'Driver 1 B Direction', 'digital out'],
      ['D8', '8', 'Driver 1 A Direction', 'digital out'],
      // Timer outputs from the Arduino AVR core's pins_arduino.h: 9 = OC1A, 10 = OC1B.
      ['D9 “~9”', '9', 'Driver 1 A PWM', 'PWM, timer 1 A'],
      ['D10 “~10”', '10', 'Driver 1 B PWM', 'PWM, timer 1 B'],
      ['D13', '13', 'Status LED', 'LED output'],
    ]);
  });

  it('gives each driver role its pin label and code, grouped under the driver', () => {
    renderSheet();
    const table = screen.getByRole('table', { name: 'Motor drivers' });
    const header = within(table).getByRole('rowheader');
    expect(header.textContent).toContain('Driver 1');
    expect(header.textContent).toContain('PWM + direction');
    expect(header.textContent).toContain('stop: brake');
    expect(header.textContent).toContain('runs at 490.2 Hz');
    const rows = within(table)
      .getAllByRole('row')
      .filter((r) => within(r).queryAllByRole('cell').length > 0)
      .map(cellsOf);
    expect(rows).toEqual([
      ['A', 'Left', 'PWM', 'D9', '~9', '9'],
      ['A', 'Left', 'Direction', 'D8', '8', '8'],
      ['B', 'Right', 'PWM', 'D10', '~10', '10'],
      ['B', 'Right', 'Direction', 'D7', '7', '7'],
    ]);
  });

  it('shows the input wiring, the revision and every caution', () => {
    renderSheet();
    const input = screen.getByRole('table', { name: 'Input: PPM sum signal' });
    expect(within(input).getAllByRole('row').slice(1).map(cellsOf)).toEqual([['PPM signal', 'D2', '2', '2']]);
    expect(screen.getByText('Revision').nextElementSibling?.textContent).toBe('5');
    expect(screen.getByText('10 Feb 2026')).toBeTruthy();
    for (const caution of SAFETY_CAUTIONS) expect(screen.getByText(caution)).toBeTruthy();
    expect(screen.getByText(/Fuse in the battery’s positive lead/)).toBeTruthy();
  });

  it('names every role still without a pin in one line of its open problems', () => {
    render(
      <MemoryRouter>
        <WiringSheet
          robotName="Test robot"
          teamName="Quarry Lane Robotics"
          revision={revisionOf(unoPlan({}, { 'Driver 1/a.pwm': null, 'input/ppm': null }), 5)}
        />
      </MemoryRouter>,
    );
    const open = screen.getByRole('region', { name: /2 open wiring problems/ });
    expect(
      within(open)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual(['Error: no pin yet for Driver 1 A PWM, PPM signal.']);
  });

  it('boxes open warnings in amber and keeps brick red for errors', () => {
    const sheetOf = (overrides: Record<string, string | null>) =>
      render(
        <MemoryRouter>
          <WiringSheet
            robotName="Test robot"
            teamName="Quarry Lane Robotics"
            revision={revisionOf(unoPlan({}, overrides), 5)}
          />
        </MemoryRouter>,
      );
    const warned = sheetOf({ 'status-led': null });
    const warning = screen.getByRole('region', { name: /1 open wiring problem/ });
    expect(within(warning).getByText(/^Warning:/)).toBeTruthy();
    expect(warning.className).toContain('border-warn');
    expect(warning.className).not.toContain('border-error');
    warned.unmount();
    sheetOf({ 'input/ppm': null });
    expect(screen.getByRole('region', { name: /open wiring problem/ }).className).toContain('border-error');
  });

  it('leaves the photo slot empty without a photo and fills it with one', () => {
    const { container, unmount } = renderSheet();
    expect(container.querySelector('[data-slot="robot-photo"]')).toBeNull();
    unmount();
    renderSheet('/photos/test-robot.jpg');
    expect(screen.getByRole('img', { name: 'Test robot, as built' }).getAttribute('src')).toBe(
      '/photos/test-robot.jpg',
    );
  });
});
