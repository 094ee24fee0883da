import { niceNumber, screenDirection, type ScreenPoint } from './screen-frame';

/**
 * A point of a polar plot in the body frame's way round: heading 0° (forward) up, 90° (left)
 * to the left, `radius` screen units from `centre`.
 */
export function polarPoint(headingDeg: number, radius: number, centre: ScreenPoint): ScreenPoint {
  const d = screenDirection(headingDeg);
  return { x: centre.x + d.x * radius, y: centre.y + d.y * radius };
}

/** Ring spacing and outer ring for values up to `max`: three to five rings at a nice step. */
export function polarRings(max: number): { step: number; outer: number; rings: number[] } {
  if (!(max > 0) || !Number.isFinite(max)) return { step: 1, outer: 1, rings: [1] };
  const step = niceNumber(max / 4);
  const count = Math.max(1, Math.ceil(max / step - 1e-9));
  const rings = Array.from({ length: count }, (_, i) => (i + 1) * step);
  return { step, outer: count * step, rings };
}
