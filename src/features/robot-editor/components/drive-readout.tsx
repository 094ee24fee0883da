import type { DriveStep } from '@shared/kinematics/drive-step';
import type { Sticks } from '@shared/kinematics/mixing';
import { STICK_AXES } from '@shared/schemas/ids';
import { formatPercent } from '../lib/screen-frame';

export interface DriveReadoutProps {
  step: DriveStep;
  /** The stick positions that went in. */
  sticks: Sticks;
  outputLimitPercent: number;
}

const AXIS_NAME = { forward: 'Forward', strafe: 'Strafe', yaw: 'Yaw' } as const;

const SMALL = 0.005;

/** Body speeds in words with units, e.g. "ahead 0.42 m/s · right 0.10 m/s · turning 35 °/s right". */
export function twistWords(twist: DriveStep['motion']['twist']): string {
  const along =
    Math.abs(twist.vxMps) < SMALL
      ? 'ahead 0.00 m/s'
      : `${twist.vxMps > 0 ? 'ahead' : 'back'} ${Math.abs(twist.vxMps).toFixed(2)} m/s`;
  const side =
    Math.abs(twist.vyMps) < SMALL
      ? 'sideways 0.00 m/s'
      : `${twist.vyMps > 0 ? 'left' : 'right'} ${Math.abs(twist.vyMps).toFixed(2)} m/s`;
  const degPerS = (twist.omegaRadps * 180) / Math.PI;
  const turn =
    Math.abs(degPerS) < 0.5
      ? 'turning 0 °/s'
      : `turning ${Math.abs(degPerS).toFixed(0)} °/s ${degPerS > 0 ? 'left' : 'right'}`;
  return `${along} · ${side} · ${turn}`;
}

/** The numbers behind the preview: each stick before and after shaping, and the body motion. */
export function DriveReadout({ step, sticks, outputLimitPercent }: DriveReadoutProps) {
  const { twist } = step.motion;
  return (
    <div className="space-y-2 text-sm">
      <table className="w-full border-collapse">
        <caption className="sr-only">Sticks before and after shaping</caption>
        <thead>
          <tr className="border-b border-rule text-left text-xs text-ink-muted">
            <th scope="col" className="py-1 font-normal">
              Axis
            </th>
            <th scope="col" className="py-1 text-right font-normal">
              Stick
            </th>
            <th scope="col" className="py-1 text-right font-normal">
              After shaping
            </th>
          </tr>
        </thead>
        <tbody className="font-mono text-[13px] tabular-nums">
          {STICK_AXES.map((axis) => (
            <tr key={axis} className={step.ignoredAxes.includes(axis) ? 'text-ink-faint' : 'text-ink'}>
              <th scope="row" className="py-0.5 text-left font-sans font-normal">
                {AXIS_NAME[axis]}
                {step.ignoredAxes.includes(axis) && <span className="ml-1 text-xs">(ignored)</span>}
              </th>
              <td className="py-0.5 text-right">{formatPercent(sticks[axis])}</td>
              <td className="py-0.5 text-right">{formatPercent(step.shapedSticks[axis])}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="font-mono text-[13px] tabular-nums text-ink-soft">{twistWords(twist)}</p>
      <p className="text-ink">The robot {step.motion.words}.</p>
      {outputLimitPercent < 100 && (
        <p className="text-xs text-ink-muted">
          Output limit {outputLimitPercent} %: every motor is scaled to it before the start threshold.
        </p>
      )}
    </div>
  );
}
