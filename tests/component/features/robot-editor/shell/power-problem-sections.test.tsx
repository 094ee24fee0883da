import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it } from 'vitest';
import { sectionsOfProblem } from '@/features/robot-editor/lib/section-problems';
import { ChassisSection } from '@/features/robot-editor/sections/chassis-section';
import { SafetySection } from '@/features/robot-editor/sections/safety-section';
import { WiringSection } from '@/features/wiring/components/wiring-section';
import { assignPins } from '@shared/pins/assign-pins';
import { robotProblems } from '@shared/problems/robot-problems';
import type { RobotConfig } from '@shared/schemas/robot-config';
import { buildStarterConfig } from '@shared/starter';
import { renderEditor, revisionDetail, robotDetail } from './render-editor';

beforeEach(() => localStorage.clear());

/**
 * A two-motor robot on one TB6612-class driver, pins placed, with 12 V motors stalling at 2 A:
 * one warning about the driver's 1.2 A continuous rating (its field is in Wiring) and one per
 * motor about the 6 V pack being too low for 12 V motors (their fields are in Chassis).
 */
function overloaded(): RobotConfig {
  const starter = buildStarterConfig({
    layout: 'differential',
    board: 'nano',
    input: 'ppm',
    driver: 'pwm-in1-in2-stby',
  });
  const placed = assignPins(starter);
  if (!placed.ok) throw new Error(placed.reason);
  return { ...placed.config, motors: placed.config.motors.map((m) => ({ ...m, stallCurrentA: 2, ratedVoltage: 12 })) };
}

function renderOverloaded(path?: string) {
  const config = overloaded();
  return renderEditor(robotDetail({ head: revisionDetail(3, config) }), {
    sections: { chassis: ChassisSection, wiring: WiringSection, safety: SafetySection },
    path,
  });
}

describe('power problems in the editor', () => {
  it('are the three warnings this robot has, and no other', () => {
    expect(robotProblems(overloaded()).map((p) => `${p.severity} ${p.code}`)).toEqual([
      'warning driver-continuous-below-stall',
      'warning battery-below-motor-rating',
      'warning battery-below-motor-rating',
    ]);
  });

  it('belong to Safety first and also to the section with their field', () => {
    const [driver, motor] = robotProblems(overloaded());
    expect(sectionsOfProblem(driver)).toEqual(['safety', 'wiring']);
    expect(sectionsOfProblem(motor)).toEqual(['safety', 'chassis']);
    expect(sectionsOfProblem({ code: 'pin-used-twice', path: ['wiring', 'drivers', 0, 'pins', 'a.pwm'] })).toEqual([
      'wiring',
    ]);
    expect(sectionsOfProblem({ code: 'logic-from-usb', path: ['power', 'logicSupply'] })).toEqual(['safety']);
  });

  it('count in Safety’s badge and in the badge of the section with their field, and once in the total', () => {
    renderOverloaded();
    const nav = screen.getByRole('navigation', { name: 'Robot sections' });
    expect(within(nav).getByRole('link', { name: /^Safety/ }).textContent).toBe('Safety3 warnings');
    expect(within(nav).getByRole('link', { name: /^Wiring/ }).textContent).toBe('Wiring1 warning');
    expect(within(nav).getByRole('link', { name: /^Chassis/ }).textContent).toBe('Chassis2 warnings');
    expect(within(nav).getByRole('link', { name: /^All problems/ }).textContent).toBe('All problems3 warnings');
  });

  it('are listed in Safety’s problem line, each linking to its field', async () => {
    const user = userEvent.setup();
    renderOverloaded();
    expect(screen.getByText('Safety: 3 warnings')).toBeTruthy();
    await user.click(screen.getByRole('button', { name: 'Show the list' }));
    const list = screen.getByRole('region', { name: 'Problems in Safety' });
    const links = within(list)
      .getAllByRole('link', { name: 'Show field' })
      .map((a) => a.getAttribute('href'));
    expect(links).toEqual([
      '/teams/team-1/robots/robot-1/wiring?field=wiring.drivers.0.continuousCurrentA',
      '/teams/team-1/robots/robot-1/chassis?field=motors.0.ratedVoltage',
      '/teams/team-1/robots/robot-1/chassis?field=motors.1.ratedVoltage',
    ]);
    expect(within(list).getByText(/stalls at 2 A, above Driver 1’s 1\.2 A continuous rating/)).toBeTruthy();
  });

  it('are listed once among all problems, under Safety', () => {
    renderOverloaded('/teams/team-1/robots/robot-1/problems');
    const safety = screen.getByRole('region', { name: 'Safety' });
    expect(within(safety).getAllByRole('listitem')).toHaveLength(3);
    expect(screen.queryByRole('region', { name: 'Wiring' })).toBeNull();
    expect(screen.queryByRole('region', { name: 'Chassis' })).toBeNull();
  });
});
