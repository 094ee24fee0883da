import type { Mixing } from '@shared/kinematics/mixing';
import { STICK_AXES, type StickAxis } from '@shared/schemas/ids';
import { formatSigned } from '../lib/screen-frame';

export interface MixingMatrixTableProps {
  /** `computeMixing(config)`. */
  mixing: Mixing;
  /** Motor whose row is emphasised. */
  highlightMotor?: string | null;
  /** Called when a motor's row is hovered or focused (for emphasis in a drawing beside it). */
  onHighlightMotor?: (motor: string | null) => void;
  caption?: string;
  className?: string;
}

const AXIS_HEADINGS: Record<StickAxis, { title: string; hint: string }> = {
  forward: { title: 'Forward', hint: 'stick ahead' },
  strafe: { title: 'Strafe', hint: 'stick right' },
  yaw: { title: 'Yaw', hint: 'turn right' },
};

/** The words for the rank of the map from body motion to motor commands. */
export function rankWords(mixing: Pick<Mixing, 'rank' | 'canDrive' | 'canStrafe' | 'canTurn'>): string {
  const can = [mixing.canDrive && 'drive', mixing.canStrafe && 'strafe', mixing.canTurn && 'turn'].filter(
    Boolean,
  ) as string[];
  if (mixing.rank === 0 || can.length === 0) return 'Rank 0: no motor command moves this robot.';
  const list = can.length === 1 ? can[0] : `${can.slice(0, -1).join(', ')} and ${can[can.length - 1]}`;
  if (mixing.rank === 3 && can.length === 3)
    return 'Rank 3: it can drive, strafe and turn at once, each stick on its own.';
  return `Rank ${mixing.rank}: it can ${list}; ${3 - can.length === 1 ? 'one stick is' : `${3 - can.length} sticks are`} ignored.`;
}

function fullScaleWords(mixing: Mixing): Record<StickAxis, string> {
  const { forwardMps, strafeMps, yawRadps } = mixing.fullScale;
  const speed = (v: number) => (v > 0 ? `${v.toFixed(2)} m/s` : 'ignored');
  return {
    forward: speed(forwardMps),
    strafe: speed(strafeMps),
    yaw: yawRadps > 0 ? `${((yawRadps * 180) / Math.PI).toFixed(0)} °/s` : 'ignored',
  };
}

/** A signed value with a small bar growing left (negative) or right (positive) from a centre tick. */
function ValueCell({ value, ignored }: { value: number; ignored: boolean }) {
  const width = Math.min(1, Math.abs(value)) * 50;
  return (
    <td className="px-2 py-1.5 text-right">
      <div className="flex items-center justify-end gap-2">
        <span
          className={`font-mono text-[13px] tabular-nums ${ignored ? 'text-ink-faint' : value === 0 ? 'text-ink-muted' : 'text-ink'}`}
        >
          {formatSigned(value, 2)}
        </span>
        <svg viewBox="0 0 100 10" className="h-2.5 w-10 shrink-0" aria-hidden="true">
          <rect x={0} y={3.5} width={100} height={3} rx={1.5} className="fill-paper-sunken" />
          {width > 0 && (
            <rect
              x={value < 0 ? 50 - width : 50}
              y={1}
              width={width}
              height={8}
              rx={1}
              className={value < 0 ? 'fill-warn' : 'fill-accent'}
            />
          )}
          <line x1={50} y1={0} x2={50} y2={10} className="stroke-ink-soft" strokeWidth={1.2} />
        </svg>
      </div>
    </td>
  );
}

/**
 * The mixing matrix: one row per motor, one column per stick; each entry is the motor's
 * command for that stick pushed fully (each column peaks at ±1), with the rank and any
 * degeneracy in words beneath.
 */
export function MixingMatrixTable({
  mixing,
  highlightMotor = null,
  onHighlightMotor,
  caption,
  className,
}: MixingMatrixTableProps) {
  const used: Record<StickAxis, boolean> = { forward: mixing.canDrive, strafe: mixing.canStrafe, yaw: mixing.canTurn };
  const full = fullScaleWords(mixing);
  return (
    <div className={`overflow-x-auto font-sans text-ink ${className ?? ''}`}>
      <table className="w-full border-collapse text-sm">
        <caption className="mb-2 text-left text-sm text-ink-muted">
          {caption ?? 'Motor command for each stick pushed fully (−1 full reverse … +1 full ahead).'}
        </caption>
        <thead>
          <tr className="border-b border-rule-strong">
            <th scope="col" className="px-2 py-1.5 text-left align-bottom font-semibold">
              Motor
            </th>
            {STICK_AXES.map((axis) => (
              <th
                key={axis}
                scope="col"
                className={`px-2 py-1.5 text-right align-bottom font-semibold ${used[axis] ? '' : 'text-ink-faint'}`}
              >
                {AXIS_HEADINGS[axis].title}
                <span className="block text-xs font-normal text-ink-muted">{AXIS_HEADINGS[axis].hint}</span>
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {mixing.motors.map((motor, i) => (
            <tr
              key={motor}
              className={`border-b border-rule ${highlightMotor === motor ? 'bg-accent-soft' : ''}`}
              onMouseEnter={onHighlightMotor && (() => onHighlightMotor(motor))}
              onMouseLeave={onHighlightMotor && (() => onHighlightMotor(null))}
            >
              <th scope="row" className="whitespace-nowrap px-2 py-1.5 text-left font-normal">
                {motor}
              </th>
              {STICK_AXES.map((axis, k) => (
                <ValueCell key={axis} value={mixing.matrix[i][k]} ignored={!used[axis]} />
              ))}
            </tr>
          ))}
        </tbody>
        <tfoot>
          <tr className="text-ink-muted">
            <th scope="row" className="whitespace-nowrap px-2 py-1.5 text-left text-xs font-normal">
              Full stick
            </th>
            {STICK_AXES.map((axis) => (
              <td key={axis} className="whitespace-nowrap px-2 py-1.5 text-right font-mono text-xs tabular-nums">
                {full[axis]}
              </td>
            ))}
          </tr>
        </tfoot>
      </table>
      <div className="mt-2 space-y-1 text-sm">
        <p className="text-ink-soft">{rankWords(mixing)}</p>
        {mixing.notes.map((note) => (
          <p key={note} className="text-warn-strong">
            {note}
          </p>
        ))}
      </div>
    </div>
  );
}
