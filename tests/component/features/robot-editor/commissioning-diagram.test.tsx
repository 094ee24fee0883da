import { render, screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import {
  CommissioningDiagram,
  expectedWheelMotion,
  rollerPatternWords,
} from '@/features/robot-editor/components/commissioning-diagram';
import { makeConfig } from '../../../factories/engine';

describe('the commissioning diagram', () => {
  it('draws the expected wheel directions for forward, strafe and yaw', () => {
    render(<CommissioningDiagram config={makeConfig('quad-mecanum')} />);
    expect(screen.getByRole('img', { name: /forward stick ahead/ })).toBeTruthy();
    expect(screen.getByRole('img', { name: /strafe stick right/ })).toBeTruthy();
    expect(screen.getByRole('img', { name: /yaw stick right/ })).toBeTruthy();
  });

  it('says which way the top of each mecanum wheel moves for a right strafe', () => {
    render(<CommissioningDiagram config={makeConfig('quad-mecanum')} />);
    const row = (name: string) => screen.getByRole('row', { name: new RegExp(`^${name}`) }).textContent;
    // X pattern strafing right: front left and rear right forwards, the other two backwards.
    expect(row('Front left')).toContain('top moves forward, 100 %top moves forward, 100 %');
    expect(row('Front right')).toMatch(/top moves forward, 100 %top moves backward, 100 %/);
  });

  it('counts the wheel’s reversal: a reversed wheel still moves the way the body needs', () => {
    expect(expectedWheelMotion({ driveAngleDeg: 0, reversed: true }, -1).words).toBe('top moves forward, 100 %');
    expect(expectedWheelMotion({ driveAngleDeg: -90, reversed: false }, 0.5).words).toBe('top moves right, 50 %');
    expect(expectedWheelMotion({ driveAngleDeg: 0, reversed: false }, 0).moving).toBe(false);
  });

  it('tells how the rollers must look from above on a mecanum base', () => {
    render(<CommissioningDiagram config={makeConfig('quad-mecanum')} />);
    expect(screen.getByRole('region', { name: /mecanum rollers/i }).textContent).toContain('form an X');
    expect(rollerPatternWords('o')!.expect).toContain('form an O');
  });

  it('leaves out the roller advice without mecanum wheels and marks an ignored stick', () => {
    render(<CommissioningDiagram config={makeConfig('differential')} />);
    expect(screen.queryByRole('region', { name: /mecanum rollers/i })).toBeNull();
    expect(screen.getByText(/This layout cannot do this/)).toBeTruthy();
  });
});
