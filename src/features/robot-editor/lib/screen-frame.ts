/**
 * The one map from the body frame to the screen, used by every drawing: body x (forward) is
 * up and body y (left) is left. SVG's y axis points down, so a body point (x, y) lands at
 * screen (−y, −x) around the drawing's centre. The map is a reflection of the numbers, but
 * with SVG's downward y it shows counter-clockwise body angles counter-clockwise on screen.
 */
export interface ScreenPoint {
  x: number;
  y: number;
}

/** Body millimetres → screen units around `origin`, `scale` screen units per millimetre. */
export function bodyToScreen(
  xMm: number,
  yMm: number,
  scale: number,
  origin: ScreenPoint = { x: 0, y: 0 },
): ScreenPoint {
  return { x: origin.x - yMm * scale + 0, y: origin.y - xMm * scale + 0 };
}

/**
 * SVG rotation (degrees, clockwise on screen, 0 = pointing right) of a body direction given
 * counter-clockwise from forward: forward (0°) → −90° (up), left (90°) → −180° (left).
 */
export function bodyAngleToSvg(bodyDeg: number): number {
  return -90 - bodyDeg;
}

/** Unit screen vector of a body direction (CCW degrees from forward). */
export function screenDirection(bodyDeg: number): ScreenPoint {
  const a = (bodyDeg * Math.PI) / 180;
  return { x: -Math.sin(a) + 0, y: -Math.cos(a) + 0 };
}

/** A "nice" number (1, 2, 2.5 or 5 × 10ⁿ) near `value`, for grid steps and scale bars. */
export function niceNumber(value: number): number {
  if (!(value > 0) || !Number.isFinite(value)) return 1;
  const power = 10 ** Math.floor(Math.log10(value));
  const fraction = value / power;
  const steps = [1, 2, 2.5, 5, 10];
  const best = steps.reduce((a, b) => (Math.abs(Math.log(b / fraction)) < Math.abs(Math.log(a / fraction)) ? b : a));
  return best * power;
}

/** Number formatting with a real minus sign and an explicit plus where asked. */
export function formatSigned(value: number, digits = 2, plus = true): string {
  const rounded = Number(value.toFixed(digits));
  const text = Math.abs(rounded).toFixed(digits);
  if (rounded === 0) return text;
  return rounded < 0 ? `\u2212${text}` : plus ? `+${text}` : text;
}

/** Whole percent with sign, e.g. "+42 %", "−7 %", "0 %". */
export function formatPercent(fraction: number): string {
  const p = Math.round(fraction * 100);
  if (p === 0) return '0\u00a0%';
  return `${p < 0 ? '\u2212' : '+'}${Math.abs(p)}\u00a0%`;
}
