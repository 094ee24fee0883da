import { describe, expect, it } from 'vitest';
import { drawingFrame } from '@/features/robot-editor/lib/chassis-geometry';
import {
  bodyAngleToSvg,
  bodyToScreen,
  formatPercent,
  formatSigned,
  niceNumber,
  screenDirection,
} from '@/features/robot-editor/lib/screen-frame';
import { makeConfig } from '../../../../factories/engine';

describe('the body-to-screen map', () => {
  it('draws forward up and left to the left', () => {
    expect(bodyToScreen(100, 0, 2, { x: 300, y: 300 })).toEqual({ x: 300, y: 100 });
    expect(bodyToScreen(0, 100, 2, { x: 300, y: 300 })).toEqual({ x: 100, y: 300 });
  });

  it('turns body angles into SVG rotations that point the same way', () => {
    for (const deg of [0, 30, 90, 150, -90]) {
      const a = (bodyAngleToSvg(deg) * Math.PI) / 180;
      const d = screenDirection(deg);
      expect(Math.cos(a)).toBeCloseTo(d.x, 12);
      expect(Math.sin(a)).toBeCloseTo(d.y, 12);
    }
  });

  it('rounds to 1, 2, 2.5 or 5 times a power of ten', () => {
    expect([0.07, 1.3, 18, 23, 240, 390, 700].map(niceNumber)).toEqual([0.05, 1, 20, 25, 250, 500, 500]);
  });

  it('fits the whole robot inside the drawing’s margins', () => {
    const frame = drawingFrame(makeConfig('skid-steer').chassis.wheels, 480, 440);
    expect(frame.scale).toBeGreaterThan(0);
    expect(frame.origin.x).toBe(240);
    expect(frame.scaleBarMm * frame.scale).toBeGreaterThan(50);
    expect(frame.scaleBarMm * frame.scale).toBeLessThan(200);
  });

  it('writes signs with a true minus', () => {
    expect(formatSigned(-0.5)).toBe('\u22120.50');
    expect(formatSigned(0.5)).toBe('+0.50');
    expect(formatSigned(-0.0001)).toBe('0.00');
    expect(formatPercent(-0.42)).toBe('\u221242\u00a0%');
  });
});
