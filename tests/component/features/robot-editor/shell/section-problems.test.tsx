import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { MemoryRouter, Route, Routes } from 'react-router';
import { describe, expect, it } from 'vitest';
import { SectionNav } from '@/features/robot-editor/components/shell/section-nav';
import { ProblemList, problemHref } from '@/features/robot-editor/components/shell/problem-list';
import { SectionProblems } from '@/features/robot-editor/components/shell/section-problems';
import { countBySection, fieldErrorProblems, type EditorProblem } from '@/features/robot-editor/lib/section-problems';
import { sectionOfPath } from '@/lib/editor-sections';
import type { Problem } from '@shared/problems/problem';

const problem = (severity: Problem['severity'], path: Problem['path'], message = 'Something is off'): Problem => ({
  severity,
  code: 'test-problem',
  pins: [],
  roles: [],
  message,
  hint: 'Do something about it',
  path,
});

describe('which section shows a field', () => {
  it.each([
    [['chassis', 'wheels', 0, 'xMm'], 'chassis'],
    [['motors', 1, 'ratedVoltage'], 'chassis'],
    [['controls', 'axes', 'yaw', 'channel'], 'controls'],
    [['wiring', 'drivers', 0, 'pins', 'a.pwm'], 'wiring'],
    [['controls', 'link', 'remotePins', 'ce', 'pin'], 'wiring'],
    [['controls', 'link', 'remoteBoard'], 'controls'],
    [['safety', 'failsafeTimeoutMs'], 'safety'],
    [['power', 'cells'], 'safety'],
    [['firmware', 'sketchName'], 'firmware'],
  ] as const)('puts %j in %s', (path, section) => {
    expect(sectionOfPath(path)).toBe(section);
  });

  it('has no section for a path outside the configuration’s parts', () => {
    expect(sectionOfPath(['schemaVersion'])).toBeNull();
  });
});

describe('problem counts per section', () => {
  it('counts errors and warnings of each section, schema errors included', () => {
    const problems: EditorProblem[] = [
      problem('error', ['wiring', 'drivers', 0, 'pins', 'a.pwm']),
      problem('warning', ['power', 'logicSupply']),
      problem('error', ['motors', 0, 'stallCurrentA']),
      ...fieldErrorProblems({ 'chassis.wheels.1.radiusMm': 'Radius must be more than 0 mm' }),
    ];
    const counts = countBySection(problems);
    expect(counts.chassis).toEqual({ errors: 2, warnings: 0 });
    expect(counts.safety).toEqual({ errors: 0, warnings: 1 });
    expect(counts.wiring).toEqual({ errors: 1, warnings: 0 });
    expect(counts.controls).toEqual({ errors: 0, warnings: 0 });
  });

  it('shows the counts beside each section in the navigation', () => {
    const counts = countBySection([
      problem('error', ['chassis', 'wheels']),
      problem('warning', ['safety', 'rampPerSecond']),
      problem('warning', ['power', 'cells']),
    ]);
    render(
      <MemoryRouter initialEntries={['/teams/t/robots/r/chassis']}>
        <SectionNav sections={['chassis', 'controls', 'safety']} counts={counts} total={{ errors: 1, warnings: 2 }} />
      </MemoryRouter>,
    );
    expect(screen.getByRole('link', { name: /Chassis/ }).textContent).toBe('Chassis1 error');
    expect(screen.getByRole('link', { name: /Safety/ }).textContent).toBe('Safety2 warnings');
    expect(screen.getByRole('link', { name: /Controls/ }).textContent).toBe('Controls');
    expect(screen.getByRole('link', { name: /All problems/ }).textContent).toBe('All problems1 error2 warnings');
  });
});

describe('links from a problem to its field', () => {
  it('leads to the section with the field’s path', () => {
    expect(problemHref(problem('error', ['chassis', 'wheels', 2, 'radiusMm']), ['chassis'])).toBe(
      '../chassis?field=chassis.wheels.2.radiusMm',
    );
  });

  it('has no link when this build has no section for it', () => {
    expect(
      problemHref(problem('error', ['wiring', 'drivers', 0, 'pins', 'a.pwm']), ['chassis', 'controls']),
    ).toBeNull();
  });

  it('lists each problem with its hint and a link to the field', () => {
    render(
      <MemoryRouter initialEntries={['/teams/t/robots/r/problems']}>
        <Routes>
          <Route
            path="/teams/:teamId/robots/:robotId/:section"
            element={
              <ProblemList
                problems={[problem('error', ['safety', 'failsafeTimeoutMs'], 'Failsafe too slow')]}
                available={['safety']}
              />
            }
          />
        </Routes>
      </MemoryRouter>,
    );
    const item = screen.getByRole('listitem');
    expect(within(item).getByText('Failsafe too slow')).toBeTruthy();
    expect(within(item).getByText('Do something about it')).toBeTruthy();
    expect(within(item).getByRole('link', { name: 'Show field' }).getAttribute('href')).toBe(
      '/teams/t/robots/r/safety?field=safety.failsafeTimeoutMs',
    );
  });

  it('tells the links of several problems apart by the problem each is about', () => {
    render(
      <MemoryRouter initialEntries={['/teams/t/robots/r/problems']}>
        <Routes>
          <Route
            path="/teams/:teamId/robots/:robotId/:section"
            element={
              <ProblemList
                problems={[
                  problem('error', ['safety', 'failsafeTimeoutMs'], 'Failsafe too slow'),
                  problem('warning', ['safety', 'rampPerSecond'], 'Ramp too steep'),
                ]}
                available={['safety']}
              />
            }
          />
        </Routes>
      </MemoryRouter>,
    );
    expect(
      screen.getByRole('link', { name: 'Show field', description: 'Warning: Ramp too steep' }).getAttribute('href'),
    ).toBe('/teams/t/robots/r/safety?field=safety.rampPerSecond');
    expect(screen.getByRole('link', { name: 'Show field', description: 'Error: Failsafe too slow' })).toBeTruthy();
  });
});

describe('the problem line above a section', () => {
  it('sums the section’s problems in one line and opens the list over the content on request', async () => {
    const user = userEvent.setup();
    render(
      <MemoryRouter>
        <SectionProblems
          label="Safety"
          available={['safety']}
          problems={[
            problem('error', ['safety', 'rampPerSecond'], 'Ramp too steep'),
            problem('warning', ['power', 'cells']),
          ]}
        />
      </MemoryRouter>,
    );
    expect(screen.getByRole('status').textContent).toBe('Safety: 1 error, 1 warning');
    expect(screen.queryByText('Ramp too steep')).toBeNull();
    await user.click(screen.getByRole('button', { name: 'Show the list' }));
    expect(screen.getByRole('region', { name: 'Problems in Safety' })).toBeTruthy();
    expect(screen.getByText('Ramp too steep')).toBeTruthy();
    await user.keyboard('{Escape}');
    expect(screen.queryByText('Ramp too steep')).toBeNull();
  });

  it('says so when the section has no problems', () => {
    render(<SectionProblems label="Controls" available={['controls']} problems={[]} />);
    expect(screen.getByRole('status').textContent).toBe('Controls: no errors or warnings');
    expect(screen.queryByRole('button')).toBeNull();
  });
});
