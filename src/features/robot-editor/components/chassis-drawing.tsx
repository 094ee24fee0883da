import { useId } from 'react';
import type { MotionFractions } from '@shared/kinematics/motion-words';
import type { DrawingFrame, WheelLike, WheelShape } from '../lib/chassis-geometry';
import { describeChassis } from '../lib/describe-chassis';
import { topRollerAngleDeg } from '@shared/kinematics/roller-pattern';
import { screenDirection, type ScreenPoint } from '../lib/screen-frame';
import {
  fitDrawing,
  LABEL_FONT_SIZE,
  LABEL_LINE_HEIGHT,
  wheelLabelLines,
  type LabelTone,
  type WheelLabelLayout,
} from '../lib/wheel-labels';
import { Arrow, DrawingGrid, ForwardMark, ScaleBar, TurnArrow } from './drawing-parts';
import { CommandArrow, WheelGlyph } from './wheel-glyph';

export interface ChassisDrawingProps {
  /** The wheel table (`config.chassis.wheels`), drawn to scale. */
  wheels: WheelLike[];
  /** Accessible name of the drawing. */
  title?: string;
  /** Design size in screen units; the SVG scales to its container's width. */
  width?: number;
  height?: number;
  /** Overlay: a command (−1..1) per motor name; each wheel shows which way it then turns and how hard. */
  motorCommands?: Record<string, number>;
  /** Overlay: the body motion those commands give (fractions of full scale, stick signs). */
  motion?: MotionFractions | null;
  /** Overlay: the motion that was meant, drawn dashed beneath `motion`. */
  intendedMotion?: MotionFractions | null;
  /** Motor whose wheels are emphasised. */
  highlightMotor?: string | null;
  /** Also draw the ground rollers, dashed (they lie mirrored beneath the top rollers). */
  showGroundRollers?: boolean;
  /** Extend each mecanum wheel's top-roller line across the drawing, so the X or O shows. */
  rollerGuides?: boolean;
  className?: string;
}

/**
 * The chassis seen from above, to scale: body x (forward) up, body y (left) left. Roller
 * lines show the rollers on top of each wheel, as a builder looking down sees them; the
 * rollers touching the ground lie mirrored across the driving direction (optional, dashed).
 */
export function ChassisDrawing({
  wheels,
  title = 'Chassis, top view',
  width = 480,
  height = 440,
  motorCommands,
  motion,
  intendedMotion,
  highlightMotor = null,
  showGroundRollers = false,
  rollerGuides = false,
  className,
}: ChassisDrawingProps) {
  const id = useId();
  const overlay = motorCommands !== undefined;
  // The robot is drawn as large as the labels leave room for, so no label is cut at the edge.
  const { frame, shapes, labels } = fitDrawing(wheels, width, height, (wheel) =>
    wheelLabelLines(wheel, overlay ? (motorCommands[wheel.motor] ?? 0) : undefined),
  );
  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-labelledby={`${id}-title ${id}-desc`}
      className={`block h-auto w-full select-none bg-paper-raised font-sans ${className ?? ''}`}
      data-scale={frame.scale}
    >
      <title id={`${id}-title`}>{title}</title>
      <desc id={`${id}-desc`}>{describeChassis(wheels, { motorCommands, motion })}</desc>
      <DrawingGrid width={width} height={height} origin={frame.origin} step={frame.gridMm * frame.scale} />
      <CentreLines frame={frame} />
      <BodyPlate frame={frame} />
      {rollerGuides && <RollerGuides shapes={shapes} frame={frame} />}
      <ForwardMark at={{ x: 18, y: 40 }} />
      {shapes.map((shape, i) => (
        <WheelGlyph
          key={`${shape.wheel.name}-${i}`}
          shape={shape}
          showDriveArrow={!overlay}
          showGroundRollers={showGroundRollers}
          highlighted={highlightMotor !== null && shape.wheel.motor === highlightMotor}
        />
      ))}
      {overlay &&
        shapes.map((shape, i) => (
          <CommandArrow key={`c${i}`} shape={shape} command={motorCommands[shape.wheel.motor] ?? 0} />
        ))}
      {intendedMotion && <MotionMark frame={frame} motion={intendedMotion} intended />}
      {motion && <MotionMark frame={frame} motion={motion} />}
      {labels.map((label, i) => (
        <WheelLabel key={`l${i}`} label={label} wheel={shapes[i].wheel.name} />
      ))}
      <ScaleBar at={{ x: 16, y: height - 16 }} lengthMm={frame.scaleBarMm} scale={frame.scale} />
      <text x={width - 14} y={height - 12} textAnchor="end" fontSize={10.5} className="fill-ink-faint font-sans">
        grid {frame.gridMm} mm
      </text>
    </svg>
  );
}

/** Each mecanum wheel's top-roller line, extended through the plate (dashed). */
function RollerGuides({ shapes, frame }: { shapes: WheelShape[]; frame: DrawingFrame }) {
  const reach = Math.hypot(frame.width, frame.height);
  return (
    <g aria-hidden="true" data-testid="roller-guides">
      {shapes
        .filter((s) => s.wheel.kind === 'mecanum')
        .map((s, i) => {
          const d = screenDirection(topRollerAngleDeg(s.wheel));
          return (
            <line
              key={i}
              x1={s.centre.x - d.x * reach}
              y1={s.centre.y - d.y * reach}
              x2={s.centre.x + d.x * reach}
              y2={s.centre.y + d.y * reach}
              className="stroke-accent"
              strokeWidth={1.2}
              strokeDasharray="6 4"
              opacity={0.8}
            />
          );
        })}
    </g>
  );
}

function CentreLines({ frame }: { frame: DrawingFrame }) {
  const { origin, width, height } = frame;
  return (
    <g aria-hidden="true" className="stroke-rule-strong" strokeWidth={0.8} strokeDasharray="10 3 2 3">
      <line x1={origin.x} y1={8} x2={origin.x} y2={height - 34} />
      <line x1={8} y1={origin.y} x2={width - 8} y2={origin.y} />
    </g>
  );
}

function BodyPlate({ frame }: { frame: DrawingFrame }) {
  const { outline, origin, scale } = frame;
  if (outline.kind === 'circle') {
    return (
      <circle
        cx={origin.x}
        cy={origin.y}
        r={outline.radiusMm * scale}
        className="fill-paper stroke-ink-soft"
        strokeWidth={1.4}
        opacity={0.92}
      />
    );
  }
  const x = origin.x - outline.left * scale;
  const y = origin.y - outline.front * scale;
  const w = (outline.left - outline.right) * scale;
  const h = (outline.front - outline.rear) * scale;
  return (
    <rect
      x={x}
      y={y}
      width={w}
      height={h}
      rx={Math.min(w, h) * 0.08}
      className="fill-paper stroke-ink-soft"
      strokeWidth={1.4}
      opacity={0.92}
    />
  );
}

function MotionMark({
  frame,
  motion,
  intended = false,
}: {
  frame: DrawingFrame;
  motion: MotionFractions;
  intended?: boolean;
}) {
  const { origin, outline, scale } = frame;
  const reach =
    (outline.kind === 'circle'
      ? outline.radiusMm
      : Math.min(outline.front - outline.rear, outline.left - outline.right) / 2) *
    scale *
    0.75;
  const tip: ScreenPoint = { x: origin.x + motion.strafe * reach, y: origin.y - motion.forward * reach };
  const moving = Math.hypot(motion.strafe, motion.forward) >= 0.05;
  const turning = Math.abs(motion.yaw) >= 0.05;
  const className = intended ? 'stroke-ink-faint fill-ink-faint' : 'stroke-warn-strong fill-warn-strong';
  return (
    <g data-testid={intended ? 'intended-motion' : 'resulting-motion'} aria-hidden="true">
      {moving && (
        <Arrow
          from={origin}
          to={tip}
          className={className}
          width={intended ? 2 : 3.2}
          head={11}
          dashed={intended}
          halo={!intended}
        />
      )}
      {turning && (
        <TurnArrow
          centre={origin}
          radius={Math.max(16, reach * 0.42) + (intended ? 6 : 0)}
          sweepDeg={60 + 200 * Math.min(1, Math.abs(motion.yaw))}
          clockwise={motion.yaw > 0}
          className={className}
          width={intended ? 2 : 3}
          dashed={intended}
        />
      )}
      {!moving && !turning && !intended && <circle cx={origin.x} cy={origin.y} r={5} className="fill-warn-strong" />}
    </g>
  );
}

const TONE: Record<LabelTone, { className: string; weight?: number }> = {
  motor: { className: 'fill-ink', weight: 600 },
  wheel: { className: 'fill-ink-muted' },
  command: { className: 'fill-accent-strong' },
  reversed: { className: 'fill-warn-strong' },
};

function WheelLabel({ label, wheel }: { label: WheelLabelLayout; wheel: string }) {
  const { at, anchor, lines, firstBaseline } = label;
  return (
    <text
      x={at.x}
      y={firstBaseline}
      textAnchor={anchor}
      fontSize={LABEL_FONT_SIZE}
      className="stroke-paper-raised font-sans"
      strokeWidth={3}
      paintOrder="stroke"
      strokeLinejoin="round"
      aria-hidden="true"
      data-testid={`label-${wheel}`}
    >
      {lines.map((line, i) => (
        <tspan
          key={i}
          x={at.x}
          dy={i === 0 ? 0 : LABEL_LINE_HEIGHT}
          className={TONE[line.tone].className}
          fontWeight={TONE[line.tone].weight}
        >
          {line.text}
        </tspan>
      ))}
    </text>
  );
}
