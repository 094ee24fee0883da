import { useCallback, useId, useRef, type PointerEvent } from 'react';
import { useHeldKeys, type KeyMap } from '../hooks/use-held-keys';

/** A stick position: x to the right, y up, each −1..1. */
export interface StickValue {
  x: number;
  y: number;
}

export const CENTRE: StickValue = { x: 0, y: 0 };
const COMPONENTS = ['x', 'y'] as const;

export interface VirtualStickProps {
  /** Accessible name, e.g. "Right stick: forward and strafe". */
  label: string;
  value: StickValue;
  onChange: (value: StickValue) => void;
  /** 'xy' moves both ways; 'x' only sideways (the other axis is locked at centre). */
  axes?: 'xy' | 'x';
  /** Keys that push the stick while it has focus. */
  keyMap: KeyMap<'x' | 'y'>;
  /** Words for the value, for screen readers, e.g. "forward 40 %, strafe right 10 %". */
  valueText: (value: StickValue) => string;
  /** One-line key help shown under the stick and linked as its description. */
  keyHelp: string;
  /** Drawn size in CSS pixels. */
  size?: number;
}

const clamp = (v: number) => Math.max(-1, Math.min(1, v)) + 0;

/**
 * An on-screen RC stick: drag it with a pointer, or focus it and hold keys; on release it
 * springs back to centre like a self-centring gimbal. Travel is square (each axis on its
 * own reaches ±1, corners included), as on a transmitter.
 */
export function VirtualStick({
  label,
  value,
  onChange,
  axes = 'xy',
  keyMap,
  valueText,
  keyHelp,
  size = 148,
}: VirtualStickProps) {
  const helpId = useId();
  const dragging = useRef(false);
  const lock = useCallback(
    (v: StickValue): StickValue => (axes === 'x' ? { x: clamp(v.x), y: 0 } : { x: clamp(v.x), y: clamp(v.y) }),
    [axes],
  );
  const keys = useHeldKeys(keyMap, COMPONENTS, (v) => onChange(lock(v)));

  const knob = size * 0.13;
  const travel = size / 2 - knob - 6;
  const fromPointer = (event: PointerEvent<HTMLDivElement>) => {
    const rect = event.currentTarget.getBoundingClientRect();
    const pxPerUnit = (travel / size) * rect.width;
    const x = (event.clientX - (rect.left + rect.width / 2)) / pxPerUnit;
    const y = -(event.clientY - (rect.top + rect.height / 2)) / pxPerUnit;
    onChange(lock({ x, y }));
  };
  const release = () => {
    dragging.current = false;
    onChange(CENTRE);
  };

  const c = size / 2;
  const kx = c + value.x * travel;
  const ky = c - value.y * travel;
  const primary = axes === 'x' ? value.x : value.y;
  return (
    <div className="inline-flex flex-col items-center gap-1.5">
      <div
        role="slider"
        tabIndex={0}
        aria-label={label}
        aria-describedby={helpId}
        aria-valuemin={-100}
        aria-valuemax={100}
        aria-valuenow={Math.round(primary * 100) + 0}
        aria-valuetext={valueText(value)}
        aria-orientation={axes === 'x' ? 'horizontal' : 'vertical'}
        className="cursor-grab touch-none rounded-xl outline-offset-4 active:cursor-grabbing"
        style={{ width: size, height: size }}
        onPointerDown={(event) => {
          dragging.current = true;
          event.currentTarget.setPointerCapture?.(event.pointerId);
          event.currentTarget.focus();
          fromPointer(event);
        }}
        onPointerMove={(event) => dragging.current && fromPointer(event)}
        onPointerUp={release}
        onPointerCancel={release}
        onKeyDown={keys.onKeyDown}
        onKeyUp={keys.onKeyUp}
        onBlur={keys.onBlur}
      >
        <svg viewBox={`0 0 ${size} ${size}`} width={size} height={size} aria-hidden="true" className="block">
          <rect
            x={1}
            y={1}
            width={size - 2}
            height={size - 2}
            rx={16}
            className="fill-paper-sunken stroke-rule-strong"
          />
          <rect
            x={c - travel}
            y={axes === 'x' ? c - 4 : c - travel}
            width={2 * travel}
            height={axes === 'x' ? 8 : 2 * travel}
            rx={axes === 'x' ? 4 : 6}
            className="fill-paper stroke-rule"
          />
          <line x1={c - travel} y1={c} x2={c + travel} y2={c} className="stroke-rule-strong" strokeDasharray="2 3" />
          {axes === 'xy' && (
            <line x1={c} y1={c - travel} x2={c} y2={c + travel} className="stroke-rule-strong" strokeDasharray="2 3" />
          )}
          <line
            x1={c}
            y1={c}
            x2={kx}
            y2={ky}
            className="stroke-ink-faint"
            strokeWidth={knob * 0.5}
            strokeLinecap="round"
          />
          <circle cx={kx} cy={ky} r={knob} className="fill-ink stroke-paper-raised" strokeWidth={2} />
          <circle cx={kx} cy={ky} r={knob * 0.45} className="fill-ink-soft" />
        </svg>
      </div>
      <span className="text-sm font-semibold text-ink">{label}</span>
      <span id={helpId} className="max-w-[14rem] text-center text-xs text-ink-muted">
        {keyHelp}
      </span>
    </div>
  );
}
