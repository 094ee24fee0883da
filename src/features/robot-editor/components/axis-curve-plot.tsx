import { useId } from 'react';
import type { AxisMap } from '@shared/schemas/robot-config';
import { shapeAxis } from '@shared/shaping/input-curves';
import { formatPercent } from '../lib/screen-frame';

export interface AxisCurvePlotProps {
  /** The axis settings (`config.controls.axes.forward` …). */
  axis: Pick<AxisMap, 'reverse' | 'deadband' | 'expo' | 'rate'>;
  /** Name of the axis, e.g. "Forward". */
  label: string;
  /** The rate switch's scale in its current position (1 without a switch). */
  rateScale?: number;
  /** A calibrated input (−1..1) to mark on the curve, e.g. the live stick. */
  input?: number | null;
  /** Design size (square) in screen units; the SVG scales to its container. */
  size?: number;
  className?: string;
}

const UNIT = { low: -1, centre: 0, high: 1 };
const SAMPLES = 200;

/** Output of the axis for a calibrated input: the engine's own shaping. */
export function axisOutput(axis: AxisCurvePlotProps['axis'], input: number, rateScale = 1): number {
  return shapeAxis(input, UNIT, axis, rateScale);
}

/**
 * The shaping curve of one axis: calibrated input (−1..1, across) to the command it gives
 * (up), showing the deadband (shaded), the expo bend and the rate (dotted level). The
 * straight diagonal is the unshaped stick for comparison.
 */
export function AxisCurvePlot({ axis, label, rateScale = 1, input = null, size = 168, className }: AxisCurvePlotProps) {
  const id = useId();
  const pad = 14;
  const half = size / 2 - pad;
  const c = size / 2;
  const sx = (x: number) => c + x * half;
  const sy = (y: number) => c - y * half;
  const points = Array.from({ length: SAMPLES + 1 }, (_, i) => -1 + (2 * i) / SAMPLES);
  const curve = points.map((x) => `${sx(x).toFixed(2)},${sy(axisOutput(axis, x, rateScale)).toFixed(2)}`).join(' ');
  const rate = axis.rate * rateScale;
  const marked = input === null ? null : { x: Math.max(-1, Math.min(1, input)), y: axisOutput(axis, input, rateScale) };
  // Percent throughout, as the deadband, expo and rate fields beside the plot show them.
  const halfStick = formatPercent(axisOutput(axis, 0.5, rateScale));
  const words =
    `${label}: deadband ${Math.round(axis.deadband * 100)} % of half travel, expo ${Math.round(axis.expo * 100)} %, ` +
    `rate ${Math.round(rate * 100)} %${axis.reverse ? ', reversed' : ''}. Half stick gives ${halfStick}.`;
  return (
    <figure className={`font-sans text-ink ${className ?? ''}`}>
      <svg
        viewBox={`0 0 ${size} ${size}`}
        role="img"
        aria-labelledby={`${id}-title ${id}-desc`}
        className="block h-auto w-full bg-paper-raised"
      >
        <title id={`${id}-title`}>{`${label} stick curve`}</title>
        <desc id={`${id}-desc`}>{words}</desc>
        <g aria-hidden="true">
          <rect x={sx(-1)} y={sy(1)} width={2 * half} height={2 * half} fill="none" className="stroke-rule" />
          {[-0.5, 0.5].map((v) => (
            <g key={v} className="stroke-grid">
              <line x1={sx(v)} y1={sy(-1)} x2={sx(v)} y2={sy(1)} />
              <line x1={sx(-1)} y1={sy(v)} x2={sx(1)} y2={sy(v)} />
            </g>
          ))}
          {axis.deadband > 0 && (
            <rect
              x={sx(-axis.deadband)}
              y={sy(1)}
              width={2 * axis.deadband * half}
              height={2 * half}
              className="fill-warn-soft"
              data-testid="deadband"
            />
          )}
          <line x1={sx(-1)} y1={sy(0)} x2={sx(1)} y2={sy(0)} className="stroke-rule-strong" />
          <line x1={sx(0)} y1={sy(-1)} x2={sx(0)} y2={sy(1)} className="stroke-rule-strong" />
          <line
            x1={sx(-1)}
            y1={sy(axis.reverse ? 1 : -1)}
            x2={sx(1)}
            y2={sy(axis.reverse ? -1 : 1)}
            className="stroke-ink-faint"
            strokeDasharray="3 3"
          />
          {rate < 0.999 &&
            [-rate, rate].map((r) => (
              <line
                key={r}
                x1={sx(-1)}
                y1={sy(r)}
                x2={sx(1)}
                y2={sy(r)}
                className="stroke-ink-muted"
                strokeDasharray="1 3"
                strokeLinecap="round"
              />
            ))}
          <text x={sx(1) - 2} y={sy(0) - 4} textAnchor="end" fontSize={10} className="fill-ink-faint">
            in
          </text>
          <text x={sx(0) + 4} y={sy(1) + 10} fontSize={10} className="fill-ink-faint">
            out
          </text>
        </g>
        <polyline
          points={curve}
          fill="none"
          className="stroke-accent-strong"
          strokeWidth={2.2}
          strokeLinejoin="round"
          data-testid="axis-curve"
        />
        {marked && (
          <circle
            cx={sx(marked.x)}
            cy={sy(marked.y)}
            r={4}
            className="fill-accent stroke-paper-raised"
            strokeWidth={1.5}
            data-testid="axis-marker"
          />
        )}
      </svg>
      <figcaption className="mt-1 text-xs text-ink-muted">
        <span className="font-semibold text-ink">{label}</span>: half stick gives{' '}
        <span className="font-mono">{halfStick}</span>
        {axis.reverse ? ', reversed' : ''}
      </figcaption>
    </figure>
  );
}
