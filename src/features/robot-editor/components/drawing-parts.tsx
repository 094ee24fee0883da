import type { ScreenPoint } from '../lib/screen-frame';

/** A straight arrow from `from` to `to` with a filled head; drawn with its own paper halo. */
export function Arrow({
  from,
  to,
  className = 'stroke-ink fill-ink',
  width = 1.6,
  head = 7,
  halo = true,
  dashed = false,
}: {
  from: ScreenPoint;
  to: ScreenPoint;
  className?: string;
  width?: number;
  head?: number;
  halo?: boolean;
  dashed?: boolean;
}) {
  const dx = to.x - from.x;
  const dy = to.y - from.y;
  const length = Math.hypot(dx, dy);
  if (length < 1e-6) return null;
  const ux = dx / length;
  const uy = dy / length;
  const h = Math.min(head, length * 0.6);
  const base = { x: to.x - ux * h, y: to.y - uy * h };
  const wing = h * 0.5;
  const points = `${to.x},${to.y} ${base.x - uy * wing},${base.y + ux * wing} ${base.x + uy * wing},${base.y - ux * wing}`;
  return (
    <g>
      {halo && (
        <>
          <line
            x1={from.x}
            y1={from.y}
            x2={base.x}
            y2={base.y}
            className="stroke-paper-raised"
            strokeWidth={width + 3}
            strokeLinecap="round"
          />
          <polygon
            points={points}
            className="fill-paper-raised stroke-paper-raised"
            strokeWidth={3}
            strokeLinejoin="round"
          />
        </>
      )}
      <line
        x1={from.x}
        y1={from.y}
        x2={base.x}
        y2={base.y}
        className={className}
        strokeWidth={width}
        strokeLinecap="round"
        strokeDasharray={dashed ? '4 3' : undefined}
        style={{ fill: 'none' }}
      />
      <polygon points={points} className={className} strokeWidth={0.8} strokeLinejoin="round" />
    </g>
  );
}

/** Square grid lines every `step` screen units, aligned so a line passes through `origin`. */
export function DrawingGrid({
  width,
  height,
  origin,
  step,
  majorEvery = 5,
}: {
  width: number;
  height: number;
  origin: ScreenPoint;
  step: number;
  majorEvery?: number;
}) {
  if (!(step > 2)) return null;
  const lines: { key: string; x1: number; y1: number; x2: number; y2: number; major: boolean }[] = [];
  const add = (axis: 'x' | 'y', from: number, to: number, start: number) => {
    const first = Math.ceil((from - start) / step);
    const last = Math.floor((to - start) / step);
    for (let k = first; k <= last; k += 1) {
      const p = start + k * step;
      const major = k % majorEvery === 0;
      lines.push(
        axis === 'x'
          ? { key: `x${k}`, x1: p, y1: 0, x2: p, y2: height, major }
          : { key: `y${k}`, x1: 0, y1: p, x2: width, y2: p, major },
      );
    }
  };
  add('x', 0, width, origin.x);
  add('y', 0, height, origin.y);
  return (
    <g aria-hidden="true">
      {lines.map((l) => (
        <line
          key={l.key}
          x1={l.x1}
          y1={l.y1}
          x2={l.x2}
          y2={l.y2}
          className={l.major ? 'stroke-rule' : 'stroke-grid'}
          strokeWidth={l.major ? 1 : 0.75}
        />
      ))}
    </g>
  );
}

/** A scale bar `lengthMm` long at `scale` screen units per millimetre, with its label. */
export function ScaleBar({ at, lengthMm, scale }: { at: ScreenPoint; lengthMm: number; scale: number }) {
  const length = lengthMm * scale;
  const label = lengthMm >= 1000 ? `${lengthMm / 1000} m` : `${lengthMm} mm`;
  return (
    <g data-testid="scale-bar" data-length={length} data-length-mm={lengthMm}>
      <rect x={at.x} y={at.y - 3} width={length / 2} height={6} className="fill-ink stroke-ink" strokeWidth={1} />
      <rect
        x={at.x + length / 2}
        y={at.y - 3}
        width={length / 2}
        height={6}
        className="fill-paper-raised stroke-ink"
        strokeWidth={1}
      />
      <text x={at.x} y={at.y - 8} fontSize={11} className="fill-ink-muted font-sans">
        0
      </text>
      <text x={at.x + length} y={at.y - 8} fontSize={11} textAnchor="end" className="fill-ink-soft font-sans">
        {label}
      </text>
    </g>
  );
}

/** The robot's forward direction: an arrow pointing up with its word. */
export function ForwardMark({ at, length = 26 }: { at: ScreenPoint; length?: number }) {
  return (
    <g aria-hidden="true">
      <Arrow
        from={{ x: at.x, y: at.y }}
        to={{ x: at.x, y: at.y - length }}
        className="stroke-ink-soft fill-ink-soft"
        width={1.8}
        head={8}
        halo={false}
      />
      <text
        x={at.x + 8}
        y={at.y - length / 2 + 4}
        fontSize={11}
        className="fill-ink-soft font-sans"
        letterSpacing={1.5}
      >
        FORWARD
      </text>
    </g>
  );
}

/** An arc arrow around `centre` for a turn: clockwise when `clockwise`. */
export function TurnArrow({
  centre,
  radius,
  sweepDeg,
  clockwise,
  className,
  width = 2,
  dashed = false,
}: {
  centre: ScreenPoint;
  radius: number;
  sweepDeg: number;
  clockwise: boolean;
  className: string;
  width?: number;
  dashed?: boolean;
}) {
  const sweep = Math.max(10, Math.min(300, sweepDeg));
  // Start at the top (−90° on screen) and run the sweep the asked way round.
  const start = -90 - (clockwise ? sweep / 2 : -sweep / 2);
  const end = start + (clockwise ? sweep : -sweep);
  const at = (deg: number) => ({
    x: centre.x + radius * Math.cos((deg * Math.PI) / 180),
    y: centre.y + radius * Math.sin((deg * Math.PI) / 180),
  });
  const p0 = at(start);
  const p1 = at(end);
  const large = sweep > 180 ? 1 : 0;
  const t = ((end + (clockwise ? 90 : -90)) * Math.PI) / 180;
  const ux = Math.cos(t);
  const uy = Math.sin(t);
  const h = 8;
  const head = `${p1.x + ux * h * 0.6},${p1.y + uy * h * 0.6} ${p1.x - ux * h * 0.4 - uy * h * 0.5},${p1.y - uy * h * 0.4 + ux * h * 0.5} ${p1.x - ux * h * 0.4 + uy * h * 0.5},${p1.y - uy * h * 0.4 - ux * h * 0.5}`;
  return (
    <g>
      <path
        d={`M ${p0.x} ${p0.y} A ${radius} ${radius} 0 ${large} ${clockwise ? 1 : 0} ${p1.x} ${p1.y}`}
        className={className}
        style={{ fill: 'none' }}
        strokeWidth={width}
        strokeLinecap="round"
        strokeDasharray={dashed ? '4 3' : undefined}
      />
      <polygon points={head} className={className} strokeWidth={0.8} strokeLinejoin="round" />
    </g>
  );
}
