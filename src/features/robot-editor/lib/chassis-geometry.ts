import type { Wheel } from '@shared/schemas/robot-config';
import { bodyAngleToSvg, bodyToScreen, niceNumber, type ScreenPoint } from './screen-frame';

export type WheelLike = Pick<
  Wheel,
  'name' | 'kind' | 'xMm' | 'yMm' | 'driveAngleDeg' | 'rollerAngleDeg' | 'radiusMm' | 'motor' | 'reversed'
>;

/**
 * A wheel's footprint seen from above, in millimetres: as long as its diameter along the
 * driving direction. Widths are not in the configuration, so they follow ordinary hobby
 * proportions (common practice: mecanum about as wide as its radius, omni and plain wheels
 * a little narrower). A track's length is not recorded either: it is drawn six radii long
 * and the drawing's description says so.
 */
export function wheelFootprintMm(wheel: Pick<Wheel, 'kind' | 'radiusMm'>): { lengthMm: number; widthMm: number } {
  const r = wheel.radiusMm;
  switch (wheel.kind) {
    case 'mecanum':
      return { lengthMm: 2 * r, widthMm: 1.0 * r };
    case 'omni':
      return { lengthMm: 2 * r, widthMm: 0.85 * r };
    case 'fixed':
      return { lengthMm: 2 * r, widthMm: 0.7 * r };
    case 'track':
    case 'omni-track':
      return { lengthMm: 6 * r, widthMm: 1.1 * r };
  }
}

export interface WheelShape {
  wheel: WheelLike;
  /** Centre on screen. */
  centre: ScreenPoint;
  /** SVG rotation of the wheel's driving direction (its long side), degrees. */
  angleDeg: number;
  /** Half length (along the driving direction) and half width, screen units. */
  halfLength: number;
  halfWidth: number;
}

export function wheelShape(wheel: WheelLike, scale: number, origin: ScreenPoint): WheelShape {
  const { lengthMm, widthMm } = wheelFootprintMm(wheel);
  return {
    wheel,
    centre: bodyToScreen(wheel.xMm, wheel.yMm, scale, origin),
    angleDeg: bodyAngleToSvg(wheel.driveAngleDeg),
    halfLength: (lengthMm / 2) * scale,
    halfWidth: (widthMm / 2) * scale,
  };
}

/** Corners of a wheel's footprint in body millimetres (for extents and hit tests). */
export function wheelCornersMm(wheel: WheelLike): { xMm: number; yMm: number }[] {
  const { lengthMm, widthMm } = wheelFootprintMm(wheel);
  const a = (wheel.driveAngleDeg * Math.PI) / 180;
  const along = { x: Math.cos(a), y: Math.sin(a) };
  const across = { x: -Math.sin(a), y: Math.cos(a) };
  return [
    [1, 1],
    [1, -1],
    [-1, -1],
    [-1, 1],
  ].map(([s, t]) => ({
    xMm: wheel.xMm + (s * lengthMm * along.x) / 2 + (t * widthMm * across.x) / 2,
    yMm: wheel.yMm + (s * lengthMm * along.y) / 2 + (t * widthMm * across.y) / 2,
  }));
}

export type BodyOutline =
  { kind: 'circle'; radiusMm: number } | { kind: 'rect'; front: number; rear: number; left: number; right: number };

/**
 * The robot's plate, for looks only: a disc for ring layouts (every wheel at the same
 * distance and driving at right angles to its radius), else a rectangle that reaches the
 * wheels' inner faces sideways and a little past the axles lengthways.
 */
export function bodyOutline(wheels: WheelLike[]): BodyOutline {
  const distances = wheels.map((w) => Math.hypot(w.xMm, w.yMm));
  const mean = distances.reduce((a, b) => a + b, 0) / Math.max(1, distances.length);
  const tangent = wheels.every((w) => {
    const radial = Math.atan2(w.yMm, w.xMm);
    return Math.abs(Math.cos(radial - (w.driveAngleDeg * Math.PI) / 180)) < 0.05;
  });
  if (wheels.length >= 3 && mean > 0 && distances.every((d) => Math.abs(d - mean) < 0.03 * mean) && tangent) {
    const widest = Math.max(...wheels.map((w) => wheelFootprintMm(w).widthMm));
    return { kind: 'circle', radiusMm: Math.max(mean - widest / 2 - 4, mean * 0.5) };
  }
  const reach = Math.max(...wheels.map((w) => w.radiusMm));
  const sideways = wheels.filter(
    (w) => Math.abs(Math.cos((w.driveAngleDeg * Math.PI) / 180)) > 0.7 && Math.abs(w.yMm) > 1,
  );
  const inner = (side: 1 | -1) => {
    const faces = sideways
      .filter((w) => Math.sign(w.yMm) === side)
      .map((w) => Math.abs(w.yMm) - wheelFootprintMm(w).widthMm / 2 - 4);
    return faces.length ? Math.min(...faces) : Math.max(...wheels.map((w) => side * w.yMm), reach);
  };
  const xs = wheels.map((w) => w.xMm);
  let front = Math.max(...xs) + reach * 0.9;
  let rear = Math.min(...xs) - reach * 0.9;
  const left = Math.max(inner(1), 20);
  const right = -Math.max(inner(-1), 20);
  // A pair of wheels on one axle still gets a plate of sensible length.
  const minHalfLength = 0.45 * (left - right);
  if (front - rear < 2 * minHalfLength) {
    const middle = (front + rear) / 2;
    front = middle + minHalfLength;
    rear = middle - minHalfLength;
  }
  return { kind: 'rect', front, rear, left, right };
}

export interface DrawingFrame {
  width: number;
  height: number;
  /** Screen units per millimetre. */
  scale: number;
  /** Where the robot's centre (body origin) is on screen. */
  origin: ScreenPoint;
  outline: BodyOutline;
  /** Grid spacing and scale bar length, millimetres. */
  gridMm: number;
  scaleBarMm: number;
}

export interface FrameMargins {
  top: number;
  bottom: number;
  side: number;
}

export const DEFAULT_MARGINS: FrameMargins = { top: 40, bottom: 42, side: 92 };

/** Fits the wheels and plate into a drawing `width` × `height`, centred on the robot's centre. */
export function drawingFrame(
  wheels: WheelLike[],
  width: number,
  height: number,
  margins: FrameMargins = DEFAULT_MARGINS,
): DrawingFrame {
  const outline = bodyOutline(wheels);
  const points = wheels.flatMap(wheelCornersMm);
  if (outline.kind === 'circle') {
    points.push({ xMm: outline.radiusMm, yMm: outline.radiusMm }, { xMm: -outline.radiusMm, yMm: -outline.radiusMm });
  } else {
    points.push({ xMm: outline.front, yMm: outline.left }, { xMm: outline.rear, yMm: outline.right });
  }
  // Body x is screen height, body y is screen width; keep the centre in the middle.
  const halfUp = Math.max(20, ...points.map((p) => Math.abs(p.xMm)));
  const halfSide = Math.max(20, ...points.map((p) => Math.abs(p.yMm)));
  const scale = Math.min((width / 2 - margins.side) / halfSide, (height - margins.top - margins.bottom) / 2 / halfUp);
  const origin = { x: width / 2, y: margins.top + (height - margins.top - margins.bottom) / 2 };
  return {
    width,
    height,
    scale,
    origin,
    outline,
    gridMm: niceNumber(22 / scale),
    scaleBarMm: niceNumber(96 / scale),
  };
}

export interface LabelPlacement {
  at: ScreenPoint;
  anchor: 'start' | 'middle' | 'end';
  /** Lines below `at` (1) or ending above it (−1) or centred on it (0). */
  vertical: -1 | 0 | 1;
}

/**
 * Where a wheel's label goes: just outside the wheel, away from the robot's centre (below it
 * for a wheel on the centre), anchored so the text runs away from the robot.
 */
export function labelPlacement(shape: WheelShape, origin: ScreenPoint, gap = 8): LabelPlacement {
  const dx = shape.centre.x - origin.x;
  const dy = shape.centre.y - origin.y;
  const length = Math.hypot(dx, dy);
  const d = length > 1 ? { x: dx / length, y: dy / length } : { x: 0, y: 1 };
  const a = (shape.angleDeg * Math.PI) / 180;
  // Half extent of the rotated footprint along d.
  const along = Math.abs(d.x * Math.cos(a) + d.y * Math.sin(a));
  const across = Math.abs(-d.x * Math.sin(a) + d.y * Math.cos(a));
  const reach = shape.halfLength * along + shape.halfWidth * across + gap;
  const at = { x: shape.centre.x + d.x * reach, y: shape.centre.y + d.y * reach };
  const anchor = d.x > 0.35 ? 'start' : d.x < -0.35 ? 'end' : 'middle';
  const vertical = d.y > 0.35 ? 1 : d.y < -0.35 ? -1 : 0;
  return { at, anchor, vertical };
}
