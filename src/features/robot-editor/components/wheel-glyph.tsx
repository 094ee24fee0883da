import type { WheelShape } from '../lib/chassis-geometry';
import { wheelMarks } from '../lib/wheel-marks';
import { Arrow } from './drawing-parts';

export interface WheelGlyphProps {
  shape: WheelShape;
  /** Draw the arrow of the driving direction for a positive command (flipped when reversed). */
  showDriveArrow?: boolean;
  /** Also draw the rollers touching the ground, dashed, mirrored beneath the top ones. */
  showGroundRollers?: boolean;
  /** Emphasis for the motor a panel is talking about. */
  highlighted?: boolean;
}

/**
 * One wheel seen from above: its footprint along the driving direction, its top rollers or
 * tread, and the arrow of the way it pushes the robot for a positive motor command.
 * Drawn in the wheel's own frame: u along the driving direction, v across it.
 */
export function WheelGlyph({
  shape,
  showDriveArrow = true,
  showGroundRollers = false,
  highlighted = false,
}: WheelGlyphProps) {
  const { wheel, centre, angleDeg, halfLength: hl, halfWidth: hw } = shape;
  const marks = wheelMarks(wheel.kind, wheel.rollerAngleDeg, hl, hw);
  const ground =
    showGroundRollers && marks.style === 'hatch' ? wheelMarks(wheel.kind, -wheel.rollerAngleDeg, hl, hw).segments : [];
  const corner = Math.min(hw * 0.45, wheel.kind === 'track' || wheel.kind === 'omni-track' ? hw : hl * 0.35);
  const arrowLength = Math.max(2 * hl + 6, 16);
  const sign = wheel.reversed ? -1 : 1;
  return (
    <g
      transform={`translate(${centre.x} ${centre.y}) rotate(${angleDeg})`}
      data-testid={`wheel-${wheel.name}`}
      data-cx={centre.x}
      data-cy={centre.y}
      data-angle={angleDeg}
    >
      <rect
        x={-hl}
        y={-hw}
        width={2 * hl}
        height={2 * hw}
        rx={corner}
        className={highlighted ? 'fill-accent-soft stroke-accent-strong' : 'fill-paper-sunken stroke-ink'}
        strokeWidth={highlighted ? 2.2 : 1.4}
      />
      {ground.map((s, i) => (
        <line
          key={`g${i}`}
          x1={s.u1}
          y1={s.v1}
          x2={s.u2}
          y2={s.v2}
          className="stroke-ink-faint"
          strokeWidth={0.8}
          strokeDasharray="2 2"
        />
      ))}
      {marks.segments.map((s, i) =>
        marks.style === 'caps' ? (
          <line
            key={i}
            x1={s.u1}
            y1={s.v1}
            x2={s.u2}
            y2={s.v2}
            className="stroke-ink-muted"
            strokeWidth={Math.max(1.6, hw * 0.38)}
            strokeLinecap="round"
            opacity={0.5}
          />
        ) : (
          <line
            key={i}
            x1={s.u1}
            y1={s.v1}
            x2={s.u2}
            y2={s.v2}
            className={marks.style === 'hatch' ? 'stroke-ink-soft' : 'stroke-ink-faint'}
            strokeWidth={marks.style === 'hatch' ? 1.3 : 1}
            strokeLinecap="round"
          />
        ),
      )}
      {showDriveArrow && (
        <g data-testid={`drive-arrow-${wheel.name}`} data-direction={sign}>
          <Arrow
            from={{ x: (-sign * arrowLength) / 2, y: 0 }}
            to={{ x: (sign * arrowLength) / 2, y: 0 }}
            className={wheel.reversed ? 'stroke-warn-strong fill-warn-strong' : 'stroke-ink fill-ink'}
            width={1.6}
            head={6}
          />
        </g>
      )}
    </g>
  );
}

/** The way a wheel turns for a command: an arrow along it, as long as the command is strong. */
export function CommandArrow({
  shape,
  command,
  showStopped = true,
}: {
  shape: WheelShape;
  command: number;
  showStopped?: boolean;
}) {
  const { centre, angleDeg, halfLength, wheel } = shape;
  const push = Math.sign(command) * (wheel.reversed ? -1 : 1);
  if (Math.abs(command) < 0.005) {
    if (!showStopped) return null;
    return (
      <g transform={`translate(${centre.x} ${centre.y})`} data-testid={`command-${wheel.name}`} data-push={0}>
        <circle r={5} className="fill-paper-raised stroke-ink-muted" strokeWidth={1.4} />
        <line x1={-3} y1={0} x2={3} y2={0} className="stroke-ink-muted" strokeWidth={1.4} />
      </g>
    );
  }
  const length = Math.max(12, (2 * halfLength + 18) * Math.min(1, Math.abs(command)));
  return (
    <g
      transform={`translate(${centre.x} ${centre.y}) rotate(${angleDeg})`}
      data-testid={`command-${wheel.name}`}
      data-push={push}
    >
      <Arrow
        from={{ x: (-push * length) / 2, y: 0 }}
        to={{ x: (push * length) / 2, y: 0 }}
        className="stroke-accent fill-accent"
        width={3}
        head={9}
      />
    </g>
  );
}
