import type { WheelKind } from '@shared/schemas/ids';

/** A line segment in a wheel's own frame: u along its driving direction, v across it (screen units). */
export interface Segment {
  u1: number;
  v1: number;
  u2: number;
  v2: number;
}

/**
 * Cuts the line through (u0, v0) with direction (du, dv) to the rectangle |u| ≤ hl, |v| ≤ hw
 * (Liang–Barsky clipping); null when it misses.
 */
export function clipLine(u0: number, v0: number, du: number, dv: number, hl: number, hw: number): Segment | null {
  let t0 = -Infinity;
  let t1 = Infinity;
  const edges: [number, number][] = [
    [-du, u0 + hl],
    [du, hl - u0],
    [-dv, v0 + hw],
    [dv, hw - v0],
  ];
  for (const [p, q] of edges) {
    if (Math.abs(p) < 1e-12) {
      if (q < 0) return null;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
  }
  if (t0 > t1 - 1e-9) return null;
  return { u1: u0 + t0 * du, v1: v0 + t0 * dv, u2: u0 + t1 * du, v2: v0 + t1 * dv };
}

/**
 * The top rollers of a mecanum wheel as parallel lines across its footprint. In the wheel's
 * rotated frame a top roller at body angle β − γ sits at +γ (screen rotations run the other
 * way round from body angles), so the lines are drawn at +γ from the driving direction.
 */
export function mecanumRollerLines(rollerAngleDeg: number, hl: number, hw: number, count = 7): Segment[] {
  const g = (rollerAngleDeg * Math.PI) / 180;
  const du = Math.cos(g);
  const dv = Math.sin(g);
  // Lines through (k·pitch, 0) along the driving direction, enough to cover the whole footprint.
  const pitch = (2 * hl) / count;
  const reach = hl + (hw * Math.abs(du)) / Math.abs(dv);
  const out: Segment[] = [];
  for (let k = -Math.ceil(reach / pitch); k <= Math.ceil(reach / pitch); k += 1) {
    const seg = clipLine(k * pitch, 0, du, dv, hl * 0.94, hw * 0.88);
    if (seg && Math.hypot(seg.u2 - seg.u1, seg.v2 - seg.v1) > hw * 0.5) out.push(seg);
  }
  return out;
}

/**
 * Omni rollers seen from above: their axes run along the driving direction, in two staggered
 * rows (the usual double-row hub); drawn as short capsules.
 */
export function omniRollerCaps(hl: number, hw: number, perRow = 3): Segment[] {
  const out: Segment[] = [];
  const piece = (2 * hl) / perRow;
  [-1, 1].forEach((side, row) => {
    const v = side * hw * 0.42;
    const shift = row === 0 ? 0 : piece / 2;
    for (let k = 0; k <= perRow; k += 1) {
      const start = -hl + shift + k * piece - piece / 2 + piece * 0.16;
      const end = start + piece * 0.68;
      const u1 = Math.max(start, -hl * 0.8);
      const u2 = Math.min(end, hl * 0.8);
      if (u2 - u1 > piece * 0.3) out.push({ u1, v1: v, u2, v2: v });
    }
  });
  return out;
}

/** Tread or track cleats: short lines across the footprint at a steady pitch. */
export function treadLines(hl: number, hw: number, pitch: number): Segment[] {
  const out: Segment[] = [];
  const n = Math.max(1, Math.floor((2 * hl * 0.9) / pitch));
  const start = -((n - 1) * pitch) / 2;
  for (let k = 0; k < n; k += 1)
    out.push({ u1: start + k * pitch, v1: -hw * 0.7, u2: start + k * pitch, v2: hw * 0.7 });
  return out;
}

/**
 * The marks drawn on a wheel of this kind: wheels with rollers show them at their roller
 * angle (capsules along the rim when γ is 0, slanted lines otherwise); plain wheels and
 * tracks show tread.
 */
export function wheelMarks(
  kind: WheelKind,
  rollerAngleDeg: number,
  hl: number,
  hw: number,
): { style: 'hatch' | 'caps' | 'tread'; segments: Segment[] } {
  if (kind === 'fixed') return { style: 'tread', segments: treadLines(hl, hw, Math.max(hl / 4, 3)) };
  if (kind === 'track') return { style: 'tread', segments: treadLines(hl, hw, Math.max(hl / 10, 3)) };
  if (Math.abs(rollerAngleDeg) >= 1)
    return { style: 'hatch', segments: mecanumRollerLines(rollerAngleDeg, hl, hw, kind === 'omni-track' ? 15 : 7) };
  return { style: 'caps', segments: omniRollerCaps(hl, hw, kind === 'omni-track' ? 7 : 3) };
}
