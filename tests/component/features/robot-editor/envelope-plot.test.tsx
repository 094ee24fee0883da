import { describe, expect, it } from 'vitest';
import { motionEnvelope } from '@shared/kinematics/envelope';
import { EnvelopePlot } from '@/features/robot-editor/components/envelope-plot';
import { polarPoint, polarRings } from '@/features/robot-editor/lib/polar';
import { makeConfig } from '../../../factories/engine';
import { numberAttr, renderSvg } from './factories';

const SIZE = 360;

/** The points of an SVG path made of M/L commands. */
function pathPoints(d: string): { x: number; y: number }[] {
  return [...d.matchAll(/(-?[\d.]+) (-?[\d.]+)/g)].map((m) => ({ x: Number(m[1]), y: Number(m[2]) }));
}

describe('the motion envelope plot', () => {
  it('puts heading 0° (forward) straight up and 90° (left) to the left', () => {
    const centre = { x: 100, y: 100 };
    expect(polarPoint(0, 50, centre)).toEqual({ x: 100, y: 50 });
    expect(polarPoint(90, 50, centre).x).toBeCloseTo(50, 12);
    expect(polarPoint(90, 50, centre).y).toBeCloseTo(100, 12);
    expect(polarPoint(-90, 50, centre).x).toBeCloseTo(150, 12);
  });

  it('draws the top speed of a heading at its radius: forward and left on a mecanum base', () => {
    const envelope = motionEnvelope(makeConfig('quad-mecanum'));
    const { svg, container } = renderSvg(<EnvelopePlot envelope={envelope} size={SIZE} />);
    const scale = numberAttr(svg, 'data-scale');
    const points = pathPoints(container.querySelector('[data-testid="envelope-limit"]')!.getAttribute('d')!);
    expect(points).toHaveLength(envelope.samples.length);
    const forward = envelope.samples[0];
    expect(forward.headingDeg).toBe(0);
    expect(points[0].x).toBeCloseTo(SIZE / 2, 1);
    expect(SIZE / 2 - points[0].y).toBeCloseTo(forward.speedMps * scale, 1);
    const left = envelope.samples[90];
    expect(left.headingDeg).toBe(90);
    expect(SIZE / 2 - points[90].x).toBeCloseTo(left.speedMps * scale, 1);
    expect(points[90].y).toBeCloseTo(SIZE / 2, 1);
  });

  it('draws a 45° heading at its radius along the diagonal, forward and left', () => {
    const envelope = motionEnvelope(makeConfig('trio-omni'));
    const { svg, container } = renderSvg(<EnvelopePlot envelope={envelope} size={SIZE} />);
    const scale = numberAttr(svg, 'data-scale');
    const p = pathPoints(container.querySelector('[data-testid="envelope-limit"]')!.getAttribute('d')!)[45];
    const r = envelope.samples[45].speedMps * scale;
    expect(Math.hypot(p.x - SIZE / 2, p.y - SIZE / 2)).toBeCloseTo(r, 1);
    expect(p.x).toBeLessThan(SIZE / 2);
    expect(p.y).toBeLessThan(SIZE / 2);
  });

  it('states the top yaw rate in words', () => {
    const envelope = motionEnvelope(makeConfig('trio-omni'));
    const { container } = renderSvg(<EnvelopePlot envelope={envelope} />);
    const degPerS = ((envelope.topYawRadps * 180) / Math.PI).toFixed(0);
    expect(container.textContent).toContain(`Spins on the spot at up to ${degPerS} °/s`);
  });

  it('picks three to five rings at a nice step', () => {
    expect(polarRings(0.84)).toEqual({ step: 0.2, outer: 1, rings: [0.2, 0.4, 0.6000000000000001, 0.8, 1] });
    expect(polarRings(2.3).rings.length).toBeGreaterThanOrEqual(3);
  });
});
