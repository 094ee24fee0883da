import { useMemo } from 'react';
import { computeMixing, mixSticks, type MixingInput } from '@shared/kinematics/mixing';
import { rollerPattern, type RollerPattern } from '@shared/kinematics/roller-pattern';
import { STICK_AXES, type StickAxis } from '@shared/schemas/ids';
import { directionWords } from '../lib/describe-chassis';
import { ChassisDrawing } from './chassis-drawing';

export interface CommissioningDiagramProps {
  /** The wheels and motors (a RobotConfig will do). */
  config: MixingInput;
  /** Motor whose wheels are emphasised (the one being checked). */
  highlightMotor?: string | null;
  className?: string;
}

const CASES: Record<StickAxis, { title: string; stick: string }> = {
  forward: { title: 'Forward', stick: 'forward stick ahead' },
  strafe: { title: 'Strafe right', stick: 'strafe stick right' },
  yaw: { title: 'Turn right', stick: 'yaw stick right (clockwise)' },
};

/**
 * Which way the top of a wheel moves (wheels off the ground) for a command: the way the
 * wheel pushes the robot, i.e. its driving direction, turned round for a negative command
 * or a reversed wheel. The reversal and the command sign cancel, so this is the physical
 * motion the body needs.
 */
export function expectedWheelMotion(
  wheel: { driveAngleDeg: number; reversed: boolean },
  command: number,
): { moving: boolean; towardDeg: number; words: string } {
  if (Math.abs(command) < 0.005) return { moving: false, towardDeg: 0, words: 'stays still' };
  const flipped = command < 0 !== wheel.reversed;
  const towardDeg = wheel.driveAngleDeg + (flipped ? 180 : 0);
  return {
    moving: true,
    towardDeg,
    words: `top moves ${directionWords(towardDeg)}, ${Math.round(Math.abs(command) * 100)} %`,
  };
}

/** What the builder should see on the mecanum wheels, in words. */
export function rollerPatternWords(pattern: RollerPattern | null): { expect: string; fix: string } | null {
  if (pattern === null) return null;
  if (pattern === 'x') {
    return {
      expect:
        'Looking down on the robot, the rollers on top of the four wheels form an X: each top roller leans toward the robot’s centre (on a square base its line runs straight through the middle).',
      fix: 'If you see an O instead (top rollers leaning away from the centre), the left and right wheels are swapped: exchange front left with front right and rear left with rear right.',
    };
  }
  if (pattern === 'o') {
    return {
      expect:
        'Looking down on the robot, the rollers on top of the four wheels form an O: each top roller leans away from the robot’s centre, like a ring around it.',
      fix: 'This wheel table asks for the O pattern, which turns poorly (on a square base it cannot turn at all). The usual build is the X; check the wheel table if the robot was built as an X.',
    };
  }
  return {
    expect:
      'The top rollers of these mecanum wheels form neither an X nor an O: some lean toward the centre and some away.',
    fix: 'Check each wheel’s roller angle in the wheel table against the wheel fitted on that corner.',
  };
}

/**
 * The wheels-up check: the expected direction of every wheel for a full forward, strafe and
 * yaw stick (arrows on the drawing and a table in words) and, for mecanum wheels, how the
 * rollers must look from above.
 */
export function CommissioningDiagram({ config, highlightMotor = null, className }: CommissioningDiagramProps) {
  const mixing = useMemo(() => computeMixing(config), [config]);
  const wheels = config.chassis.wheels;
  const cases = STICK_AXES.map((axis) => {
    const unit = { forward: 0, strafe: 0, yaw: 0, [axis]: 1 };
    const commands = mixSticks(mixing, unit);
    const applicable = commands.some((c) => c !== 0);
    return { axis, unit, applicable, byMotor: Object.fromEntries(mixing.motors.map((m, i) => [m, commands[i]])) };
  });
  const pattern = rollerPatternWords(rollerPattern(wheels));
  return (
    <div className={`space-y-4 font-sans text-ink ${className ?? ''}`}>
      <p className="text-sm text-ink-soft">
        With the wheels off the ground, the top of each wheel should move the way its arrow points. A wheel that turns
        the other way is reversed; a wheel that moves when another was expected is on the wrong motor.
      </p>
      <div className="grid gap-3 sm:grid-cols-3">
        {cases.map((c) => (
          <figure key={c.axis} className="rounded border border-rule bg-paper-raised p-2">
            <figcaption className="mb-1 text-sm">
              <span className="font-semibold">{CASES[c.axis].title}</span>{' '}
              <span className="text-ink-muted">({CASES[c.axis].stick})</span>
            </figcaption>
            {c.applicable ? (
              <ChassisDrawing
                wheels={wheels}
                title={`Expected wheel directions for the ${CASES[c.axis].stick}`}
                motorCommands={c.byMotor}
                intendedMotion={c.unit}
                highlightMotor={highlightMotor}
                width={420}
                height={400}
              />
            ) : (
              <p className="px-2 py-8 text-center text-sm text-ink-muted">
                This layout cannot do this; the stick is ignored.
              </p>
            )}
          </figure>
        ))}
      </div>
      <table className="w-full border-collapse text-sm">
        <caption className="mb-1 text-left font-semibold">
          Expected direction of each wheel (wheels off the ground)
        </caption>
        <thead>
          <tr className="border-b border-rule-strong text-left">
            <th scope="col" className="px-2 py-1 font-semibold">
              Wheel
            </th>
            {cases.map((c) => (
              <th key={c.axis} scope="col" className="px-2 py-1 font-semibold">
                {CASES[c.axis].title}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {wheels.map((wheel) => (
            <tr
              key={wheel.name}
              className={`border-b border-rule ${highlightMotor === wheel.motor ? 'bg-accent-soft' : ''}`}
            >
              <th scope="row" className="px-2 py-1 text-left font-normal">
                {wheel.name}
                {wheel.motor !== wheel.name && <span className="text-ink-muted"> (motor {wheel.motor})</span>}
              </th>
              {cases.map((c) => (
                <td key={c.axis} className="px-2 py-1 text-ink-soft">
                  {c.applicable ? expectedWheelMotion(wheel, c.byMotor[wheel.motor] ?? 0).words : '—'}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
      {pattern && (
        <section
          aria-label="Mecanum rollers seen from above"
          className="grid items-start gap-4 rounded border border-rule bg-paper-raised p-3 sm:grid-cols-[minmax(0,1fr)_minmax(0,1.3fr)]"
        >
          <ChassisDrawing
            wheels={wheels}
            title="Mecanum rollers seen from above, with their lines extended"
            rollerGuides
            width={420}
            height={400}
          />
          <div className="space-y-2 text-sm">
            <h3 className="font-semibold">Mecanum rollers, seen from above</h3>
            <p>{pattern.expect}</p>
            <p className="text-ink-soft">{pattern.fix}</p>
            <p className="text-ink-muted">
              The drawing shows the rollers on top of each wheel, where you look. The rollers touching the ground lie
              the other way (mirrored across the wheel), so the pattern seen from below is the opposite one.
            </p>
          </div>
        </section>
      )}
    </div>
  );
}
