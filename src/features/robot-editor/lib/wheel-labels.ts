import {
  drawingFrame,
  labelPlacement,
  wheelShape,
  type DrawingFrame,
  type LabelPlacement,
  type WheelLike,
  type WheelShape,
} from './chassis-geometry';
import { formatPercent, niceNumber } from './screen-frame';

/** Type size of the wheel labels and the distance between their baselines, screen units. */
export const LABEL_FONT_SIZE = 12;
export const LABEL_LINE_HEIGHT = 14;
/** A label line longer than this wraps at a space (or is cut with an ellipsis). */
export const LABEL_MAX_WIDTH = 128;

export type LabelTone = 'motor' | 'wheel' | 'command' | 'reversed';

export interface LabelLine {
  text: string;
  tone: LabelTone;
}

export interface Box {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export interface WheelLabelLayout extends LabelPlacement {
  lines: LabelLine[];
  /** Baseline of the first line. */
  firstBaseline: number;
  /** Where the label's ink can reach (estimated text widths, halo included). */
  box: Box;
}

export interface FittedDrawing {
  frame: DrawingFrame;
  shapes: WheelShape[];
  labels: WheelLabelLayout[];
}

// Advance widths in em, rounded up from the sans-serif the app ships (Source Sans 3) so the
// estimate errs wide; the labels' bold first line is allowed 6 % more.
const NARROW = new Set([..." .,:;'!|()[]ijlrtf"]);
const WIDE = new Set([...'mwMW%']);

/** Estimated width of `text` in screen units at `fontSize` (no text metrics outside a browser). */
export function estimateTextWidth(text: string, fontSize = LABEL_FONT_SIZE, bold = false): number {
  let em = 0;
  for (const ch of text) {
    if (NARROW.has(ch)) em += 0.3;
    else if (WIDE.has(ch)) em += 0.82;
    else if (ch >= 'A' && ch <= 'Z') em += 0.62;
    else em += 0.51;
  }
  return em * fontSize * (bold ? 1.06 : 1);
}

/** Breaks `text` at spaces into lines no wider than `maxWidth`; a word too long alone is cut with an ellipsis. */
export function wrapText(text: string, maxWidth = LABEL_MAX_WIDTH, bold = false): string[] {
  const fits = (s: string) => estimateTextWidth(s, LABEL_FONT_SIZE, bold) <= maxWidth;
  const cut = (word: string) => {
    let s = word;
    while (s.length > 1 && !fits(`${s}…`)) s = s.slice(0, -1);
    return `${s}…`;
  };
  const lines: string[] = [];
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const last = lines.at(-1);
    if (last !== undefined && fits(`${last} ${word}`)) lines[lines.length - 1] = `${last} ${word}`;
    else lines.push(fits(word) ? word : cut(word));
  }
  return lines.length ? lines : [''];
}

/** What a wheel's label says: its motor, the wheel when named apart, and the command or "reversed". */
export function wheelLabelLines(wheel: WheelLike, command?: number): LabelLine[] {
  const lines: LabelLine[] = wrapText(wheel.motor, LABEL_MAX_WIDTH, true).map((text) => ({ text, tone: 'motor' }));
  if (wheel.name !== wheel.motor)
    lines.push(...wrapText(`wheel ${wheel.name}`).map((text): LabelLine => ({ text, tone: 'wheel' })));
  if (command !== undefined) lines.push({ text: formatPercent(command), tone: 'command' });
  else if (wheel.reversed) lines.push({ text: 'reversed', tone: 'reversed' });
  return lines;
}

/** Lines of a label placed at `placement`: where the first baseline goes and the box the ink fills. */
export function layoutLabel(placement: LabelPlacement, lines: LabelLine[]): WheelLabelLayout {
  const { at, anchor, vertical } = placement;
  const n = lines.length;
  const firstBaseline =
    vertical === 1
      ? at.y + 10
      : vertical === -1
        ? at.y - (n - 1) * LABEL_LINE_HEIGHT - 2
        : at.y + 4 - ((n - 1) * LABEL_LINE_HEIGHT) / 2;
  const width = Math.max(...lines.map((l) => estimateTextWidth(l.text, LABEL_FONT_SIZE, l.tone === 'motor')));
  const left = anchor === 'start' ? at.x : anchor === 'end' ? at.x - width : at.x - width / 2;
  // Ascent and descent of the face at 12 px (measured in Chromium), plus the 1.5-unit paper halo.
  const halo = 1.5;
  const box = {
    left: left - halo,
    right: left + width + halo,
    top: firstBaseline - 11 - halo,
    bottom: firstBaseline + (n - 1) * LABEL_LINE_HEIGHT + 4 + halo,
  };
  return { ...placement, lines, firstBaseline, box };
}

function overlaps(a: Box, b: Box): boolean {
  return a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;
}

/**
 * The room labels may use: inside the drawing with a small edge, above the scale bar's strip and
 * clear of the forward mark in the top-left corner.
 */
export function labelRoom(width: number, height: number): { inside: Box; keepOut: Box[] } {
  return {
    inside: { left: 4, right: width - 4, top: 4, bottom: height - 30 },
    keepOut: [{ left: 8, right: 100, top: 0, bottom: 46 }],
  };
}

function fitsRoom(box: Box, room: ReturnType<typeof labelRoom>): boolean {
  const { inside, keepOut } = room;
  return (
    box.left >= inside.left &&
    box.right <= inside.right &&
    box.top >= inside.top &&
    box.bottom <= inside.bottom &&
    !keepOut.some((k) => overlaps(box, k))
  );
}

function placeAt(
  wheels: WheelLike[],
  base: DrawingFrame,
  scale: number,
  linesFor: (wheel: WheelLike) => LabelLine[],
): FittedDrawing {
  const frame = { ...base, scale, gridMm: niceNumber(22 / scale), scaleBarMm: niceNumber(96 / scale) };
  const shapes = wheels.map((w) => wheelShape(w, scale, frame.origin));
  const labels = shapes.map((shape) => layoutLabel(labelPlacement(shape, frame.origin), linesFor(shape.wheel)));
  return { frame, shapes, labels };
}

/**
 * Fits the wheels, the plate and every wheel's label into `width` × `height`: the robot is drawn
 * as large as the wheels allow, then made smaller, step by step, until no label runs past the
 * edge or over the forward mark and the scale bar. The drawing's size never changes, so typing a
 * longer motor name does not move the page.
 */
export function fitDrawing(
  wheels: WheelLike[],
  width: number,
  height: number,
  linesFor: (wheel: WheelLike) => LabelLine[],
): FittedDrawing {
  const base = drawingFrame(wheels, width, height);
  const room = labelRoom(width, height);
  const smallest = base.scale * 0.3;
  let fitted = placeAt(wheels, base, base.scale, linesFor);
  while (!fitted.labels.every((l) => fitsRoom(l.box, room)) && fitted.frame.scale * 0.96 >= smallest) {
    fitted = placeAt(wheels, base, fitted.frame.scale * 0.96, linesFor);
  }
  return fitted;
}
