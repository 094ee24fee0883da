import { useId } from 'react';
import type { MotionEnvelope } from '@shared/kinematics/envelope';
import { polarPoint, polarRings } from '../lib/polar';
import type { ScreenPoint } from '../lib/screen-frame';

export interface EnvelopePlotProps {
  /** `motionEnvelope(config)`. */
  envelope: MotionEnvelope;
  title?: string;
  /** Design size of the square plot in screen units; the SVG scales to its container. */
  size?: number;
  className?: string;
}

const SPOKES = [
  { deg: 0, label: 'Forward' },
  { deg: 90, label: 'Left' },
  { deg: 180, label: 'Back' },
  { deg: 270, label: 'Right' },
];

const path = (points: ScreenPoint[]) =>
  points.length ? `M ${points.map((p) => `${p.x.toFixed(2)} ${p.y.toFixed(2)}`).join(' L ')} Z` : '';

/** Top yaw rate in words. */
export function yawRateWords(topYawRadps: number): string {
  if (!(topYawRadps > 0)) return 'It cannot turn on the spot.';
  const degPerS = (topYawRadps * 180) / Math.PI;
  const turns = topYawRadps / (2 * Math.PI);
  return `Spins on the spot at up to ${degPerS.toFixed(0)} °/s (${topYawRadps.toFixed(1)} rad/s, ${turns.toFixed(2)} turns a second).`;
}

/** Where the envelope reaches furthest, in words. */
export function topSpeedWords(envelope: MotionEnvelope): string {
  if (!(envelope.topSpeedMps > 0)) return 'It cannot move in a straight line.';
  const best = envelope.samples.filter((s) => s.speedMps >= envelope.topSpeedMps * 0.999).map((s) => s.headingDeg);
  const slowest = Math.min(...envelope.samples.filter((s) => s.speedMps > 0).map((s) => s.speedMps));
  const all = envelope.samples.every((s) => s.speedMps > 0);
  const where = best.length <= 4 ? ` heading ${best.map((h) => `${Math.round(h)}°`).join(', ')}` : '';
  return (
    `Top speed ${envelope.topSpeedMps.toFixed(2)} m/s${where}` +
    (all ? `; at least ${slowest.toFixed(2)} m/s in every heading.` : '; some headings are out of reach.')
  );
}

/** Whether full stick reaches the wheels' limit everywhere, in words. */
export function fullStickWords(envelope: MotionEnvelope): string {
  const reachable = envelope.samples.filter((s) => s.speedMps > 0);
  if (reachable.length === 0) return '';
  const worst = Math.min(...reachable.map((s) => s.fullStickMps / s.speedMps));
  if (worst > 0.99) return 'Full stick reaches the wheel limit in every heading (the two lines coincide).';
  return `Full stick gives at least ${Math.round(worst * 100)} % of the wheel limit in every heading it can go.`;
}

/**
 * The motion envelope as a polar plot: the top speed the wheels allow in every heading
 * (filled), and the speed full stick gives after mixing and desaturation (dashed). Heading
 * 0° is forward (up) and 90° is left, counter-clockwise like the body frame.
 */
export function EnvelopePlot({ envelope, title = 'Motion envelope', size = 360, className }: EnvelopePlotProps) {
  const id = useId();
  const centre = { x: size / 2, y: size / 2 };
  const radius = size / 2 - 38;
  const peak = Math.max(envelope.topSpeedMps, ...envelope.samples.map((s) => s.fullStickMps));
  const { outer, rings } = polarRings(peak);
  const scale = radius / outer;
  const limit = envelope.samples.map((s) => polarPoint(s.headingDeg, s.speedMps * scale, centre));
  const stick = envelope.samples.map((s) => polarPoint(s.headingDeg, s.fullStickMps * scale, centre));
  const isolated = envelope.samples.filter((s, i, all) => {
    const before = all[(i - 1 + all.length) % all.length].speedMps;
    const after = all[(i + 1) % all.length].speedMps;
    return s.speedMps > 0 && before === 0 && after === 0;
  });
  return (
    <figure className={`font-sans text-ink ${className ?? ''}`}>
      <svg
        viewBox={`0 0 ${size} ${size}`}
        role="img"
        aria-labelledby={`${id}-title ${id}-desc`}
        className="block h-auto w-full bg-paper-raised"
        data-scale={scale}
      >
        <title id={`${id}-title`}>{title}</title>
        <desc
          id={`${id}-desc`}
        >{`${topSpeedWords(envelope)} ${yawRateWords(envelope.topYawRadps)} Heading 0° is forward, drawn up; 90° is left.`}</desc>
        <g aria-hidden="true">
          {rings.map((r) => (
            <circle
              key={r}
              cx={centre.x}
              cy={centre.y}
              r={r * scale}
              fill="none"
              className={r === outer ? 'stroke-rule-strong' : 'stroke-grid'}
              strokeWidth={1}
            />
          ))}
          {Array.from({ length: 12 }, (_, k) => k * 30).map((deg) => {
            const end = polarPoint(deg, radius, centre);
            return (
              <line
                key={deg}
                x1={centre.x}
                y1={centre.y}
                x2={end.x}
                y2={end.y}
                className={deg % 90 === 0 ? 'stroke-rule' : 'stroke-grid'}
                strokeWidth={1}
              />
            );
          })}
          {SPOKES.map(({ deg, label }) => {
            const at = polarPoint(deg, radius + 16, centre);
            return (
              <text
                key={deg}
                x={at.x}
                y={at.y + 4}
                textAnchor="middle"
                fontSize={11}
                className="fill-ink-muted"
                letterSpacing={0.5}
              >
                {label}
              </text>
            );
          })}
          {rings.map((r) => {
            const at = polarPoint(-45, r * scale, centre);
            return (
              <text
                key={`t${r}`}
                x={at.x + 3}
                y={at.y - 3}
                fontSize={10}
                className="fill-ink-faint stroke-paper-raised"
                strokeWidth={3}
                paintOrder="stroke"
              >
                {`${Number(r.toFixed(2))} m/s`}
              </text>
            );
          })}
        </g>
        <path
          d={path(limit)}
          className="fill-accent-soft stroke-accent"
          strokeWidth={2}
          strokeLinejoin="round"
          fillOpacity={0.75}
          data-testid="envelope-limit"
        />
        {isolated.map((s) => {
          const p = polarPoint(s.headingDeg, s.speedMps * scale, centre);
          return <circle key={s.headingDeg} cx={p.x} cy={p.y} r={4} className="fill-accent" />;
        })}
        <path
          d={path(stick)}
          fill="none"
          className="stroke-ink-soft"
          strokeWidth={1.5}
          strokeDasharray="5 3"
          strokeLinejoin="round"
          data-testid="envelope-full-stick"
        />
        <circle cx={centre.x} cy={centre.y} r={2.5} className="fill-ink" />
      </svg>
      <figcaption className="mt-2 space-y-1 text-sm">
        <p className="flex flex-wrap gap-x-4 gap-y-1 text-ink-muted">
          <span className="inline-flex items-center gap-1.5">
            <span
              className="inline-block h-2.5 w-4 rounded-sm border-2 border-accent bg-accent-soft"
              aria-hidden="true"
            />{' '}
            wheel limit
          </span>
          <span className="inline-flex items-center gap-1.5">
            <span className="inline-block w-4 border-t-2 border-dashed border-ink-soft" aria-hidden="true" /> full stick
          </span>
        </p>
        <p className="text-ink-soft">{topSpeedWords(envelope)}</p>
        <p className="text-ink-soft">{fullStickWords(envelope)}</p>
        <p className="text-ink-soft">{yawRateWords(envelope.topYawRadps)}</p>
      </figcaption>
    </figure>
  );
}
