import { formatPercent } from '../lib/screen-frame';

export interface MotorBarsProps {
  /** Motor names, in the order of `outputs`. */
  motors: string[];
  /** Signed duty each driver gets (−1..1). */
  outputs: number[];
  /** Optional marks: what mixing asked for before the ramp and output limit (−1..1). */
  targets?: number[];
  className?: string;
}

/**
 * One bar per motor: the signed duty its driver gets, growing right for ahead and left for
 * reverse from a centre line; a thin mark shows the mixed target it is ramping toward.
 */
export function MotorBars({ motors, outputs, targets, className }: MotorBarsProps) {
  return (
    <ul className={`space-y-1.5 font-sans ${className ?? ''}`} aria-label="Motor commands">
      {motors.map((motor, i) => {
        const value = Math.max(-1, Math.min(1, outputs[i] ?? 0));
        const target = targets?.[i];
        const percent = Math.round(value * 100) + 0;
        return (
          <li key={motor} className="grid grid-cols-[7.5rem_minmax(0,1fr)_3.5rem] items-center gap-2 text-sm">
            <span className="truncate text-ink" id={`bar-${i}-${motor}`}>
              {motor}
            </span>
            <div
              role="meter"
              aria-labelledby={`bar-${i}-${motor}`}
              aria-valuemin={-100}
              aria-valuemax={100}
              aria-valuenow={percent}
              aria-valuetext={`${formatPercent(value)} ${value > 0 ? 'ahead' : value < 0 ? 'reverse' : 'stopped'}`}
              data-value={value}
              className="relative h-3.5 rounded-sm bg-paper-sunken"
            >
              <div
                className={`absolute top-0 h-full ${value < 0 ? 'rounded-l-sm bg-warn' : 'rounded-r-sm bg-accent'}`}
                style={
                  value < 0 ? { right: '50%', width: `${-value * 50}%` } : { left: '50%', width: `${value * 50}%` }
                }
              />
              {target !== undefined && (
                <div
                  className="absolute -top-0.5 h-[calc(100%+4px)] w-0.5 bg-ink-soft"
                  style={{ left: `calc(${50 + Math.max(-1, Math.min(1, target)) * 50}% - 1px)` }}
                />
              )}
              <div className="absolute left-1/2 top-[-3px] h-[calc(100%+6px)] w-px bg-ink" />
            </div>
            <span className="text-right font-mono text-[13px] tabular-nums text-ink-soft">{formatPercent(value)}</span>
          </li>
        );
      })}
    </ul>
  );
}
