import { describe, expect, it } from 'vitest';
import { NEW_ROBOT_DEFAULTS, starterRobot } from '@/features/robots/lib/starter-robot';
import { robotProblems } from '@shared/problems/robot-problems';
import { DRIVE_LAYOUT_IDS, DRIVER_KIND_IDS } from '@shared/schemas/ids';

const describeProblems = (layout: string, driver: string) => (p: { severity: string; code: string; message: string }) =>
  `${layout}/${driver}: ${p.severity} ${p.code}: ${p.message}`;

describe('a new robot from a starter layout', () => {
  it.each(DRIVE_LAYOUT_IDS)('opens %s with no errors and no warnings on the form’s first choices', (layout) => {
    const { config, pins } = starterRobot({ ...NEW_ROBOT_DEFAULTS, layout });
    expect(pins.placed).toBe(true);
    expect(robotProblems(config).map(describeProblems(layout, NEW_ROBOT_DEFAULTS.driver))).toEqual([]);
  });

  // The Mega has PWM pins for every driver kind's roles and 5 V logic, so nothing about the pins
  // gets in the way: what is left is whether each kind's starter motors and battery agree.
  it.each(DRIVER_KIND_IDS)('opens every layout with %s drivers on a Mega with no errors and no warnings', (driver) => {
    for (const layout of DRIVE_LAYOUT_IDS) {
      const { config, pins } = starterRobot({ layout, board: 'mega2560', input: 'ppm', driver });
      expect(pins.placed, `${layout}/${driver}`).toBe(true);
      expect(robotProblems(config).map(describeProblems(layout, driver))).toEqual([]);
    }
  });
});
