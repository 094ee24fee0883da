import { useId } from 'react';
import { bodyOutline, wheelCornersMm, wheelShape, type WheelLike } from '../lib/chassis-geometry';
import type { Pose } from '../lib/pose';
import { niceNumber, type ScreenPoint } from '../lib/screen-frame';
import { CommandArrow, WheelGlyph } from './wheel-glyph';

export interface PreviewArenaProps {
  wheels: WheelLike[];
  pose: Pose;
  /** Where the robot's centre has been, world metres, oldest first. */
  trail: readonly { xM: number; yM: number }[];
  /** Command per motor name, shown as arrows on the wheels. */
  motorCommands: Record<string, number>;
  width?: number;
  height?: number;
  /** Words for what the robot is doing, for screen readers. */
  description: string;
}

/** Half the robot's size in millimetres (furthest wheel corner from its centre). */
export function robotReachMm(wheels: WheelLike[]): number {
  return Math.max(50, ...wheels.flatMap(wheelCornersMm).map((p) => Math.hypot(p.xMm, p.yMm)));
}

/**
 * The floor seen from above with the robot in the middle: the view follows the robot, so
 * the grid and the path slide past as it drives. World axes are the robot's at the start
 * (forward up, left left), the same map as every drawing.
 */
export function PreviewArena({
  wheels,
  pose,
  trail,
  motorCommands,
  width = 560,
  height = 400,
  description,
}: PreviewArenaProps) {
  const id = useId();
  const pxPerMm = (height * 0.17) / robotReachMm(wheels);
  const pxPerM = pxPerMm * 1000;
  const centre = { x: width / 2, y: height / 2 };
  const toScreen = (xM: number, yM: number): ScreenPoint => ({
    x: centre.x - (yM - pose.yM) * pxPerM,
    y: centre.y - (xM - pose.xM) * pxPerM,
  });
  const gridM = niceNumber(56 / pxPerM);
  const outline = bodyOutline(wheels);
  const shapes = wheels.map((w) => wheelShape(w, pxPerMm, { x: 0, y: 0 }));
  const headingDeg = (pose.thetaRad * 180) / Math.PI;
  const path = trail.map((p) => toScreen(p.xM, p.yM));
  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-labelledby={`${id}-t ${id}-d`}
      className="block h-auto w-full bg-paper-raised font-sans"
    >
      <title id={`${id}-t`}>Drive preview, top view of the floor</title>
      <desc id={`${id}-d`}>{description}</desc>
      <FloorGrid width={width} height={height} origin={toScreen(0, 0)} step={gridM * pxPerM} />
      {path.length > 1 && (
        <polyline
          points={path.map((p) => `${p.x.toFixed(1)},${p.y.toFixed(1)}`).join(' ')}
          fill="none"
          className="stroke-accent"
          strokeWidth={2}
          strokeLinejoin="round"
          strokeLinecap="round"
          opacity={0.7}
          data-testid="trail"
        />
      )}
      <g transform={`translate(${centre.x} ${centre.y}) rotate(${-headingDeg})`} data-testid="robot">
        {outline.kind === 'circle' ? (
          <circle r={outline.radiusMm * pxPerMm} className="fill-paper stroke-ink-soft" strokeWidth={1.4} />
        ) : (
          <rect
            x={-outline.left * pxPerMm}
            y={-outline.front * pxPerMm}
            width={(outline.left - outline.right) * pxPerMm}
            height={(outline.front - outline.rear) * pxPerMm}
            rx={4}
            className="fill-paper stroke-ink-soft"
            strokeWidth={1.4}
          />
        )}
        <HeadingMark reach={(outline.kind === 'circle' ? outline.radiusMm : outline.front) * pxPerMm} />
        {shapes.map((shape, i) => (
          <WheelGlyph key={i} shape={shape} showDriveArrow={false} />
        ))}
        {shapes.map((shape, i) => (
          <CommandArrow
            key={`c${i}`}
            shape={shape}
            command={motorCommands[shape.wheel.motor] ?? 0}
            showStopped={false}
          />
        ))}
      </g>
      <text x={width - 10} y={height - 10} textAnchor="end" fontSize={11} className="fill-ink-faint">
        grid {gridM >= 1 ? `${gridM} m` : `${Math.round(gridM * 1000)} mm`}
      </text>
    </svg>
  );
}

function HeadingMark({ reach }: { reach: number }) {
  const tip = -reach + 3;
  return (
    <polygon points={`0,${tip} ${-6},${tip + 11} ${6},${tip + 11}`} className="fill-ink-soft" aria-hidden="true" />
  );
}

function FloorGrid({
  width,
  height,
  origin,
  step,
}: {
  width: number;
  height: number;
  origin: ScreenPoint;
  step: number;
}) {
  const lines: { k: string; x1: number; y1: number; x2: number; y2: number; axis: boolean }[] = [];
  for (let k = Math.ceil(-origin.x / step); origin.x + k * step <= width; k += 1) {
    const x = origin.x + k * step;
    lines.push({ k: `v${k}`, x1: x, y1: 0, x2: x, y2: height, axis: k === 0 });
  }
  for (let k = Math.ceil(-origin.y / step); origin.y + k * step <= height; k += 1) {
    const y = origin.y + k * step;
    lines.push({ k: `h${k}`, x1: 0, y1: y, x2: width, y2: y, axis: k === 0 });
  }
  return (
    <g aria-hidden="true">
      {lines.map((l) => (
        <line
          key={l.k}
          x1={l.x1}
          y1={l.y1}
          x2={l.x2}
          y2={l.y2}
          className={l.axis ? 'stroke-rule-strong' : 'stroke-grid'}
          strokeWidth={l.axis ? 1.2 : 1}
        />
      ))}
      <circle cx={origin.x} cy={origin.y} r={4} className="fill-none stroke-ink-faint" strokeWidth={1.2} />
    </g>
  );
}
