import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { shapeAxis } from '@shared/shaping/input-curves';
import { AxisCurvePlot } from '@/features/robot-editor/components/axis-curve-plot';
import { numberAttr, renderSvg } from './factories';

const AXIS = { reverse: false, deadband: 0.1, expo: 0.5, rate: 0.8 };
const SIZE = 168;
const PAD = 14;
const HALF = SIZE / 2 - PAD;

describe('the axis curve plot', () => {
  it('follows the engine’s shaping at every sample', () => {
    const { container } = renderSvg(<AxisCurvePlot axis={AXIS} label="Forward" size={SIZE} />);
    const points = container
      .querySelector('[data-testid="axis-curve"]')!
      .getAttribute('points')!
      .split(' ')
      .map((p) => p.split(',').map(Number));
    for (const [sx, sy] of points) {
      const input = (sx - SIZE / 2) / HALF;
      expect((SIZE / 2 - sy) / HALF).toBeCloseTo(shapeAxis(input, { low: -1, centre: 0, high: 1 }, AXIS), 2);
    }
  });

  it('shades the deadband across its width', () => {
    const { container } = renderSvg(<AxisCurvePlot axis={AXIS} label="Forward" size={SIZE} />);
    const band = container.querySelector('[data-testid="deadband"]')!;
    expect(numberAttr(band, 'width')).toBeCloseTo(2 * 0.1 * HALF, 9);
  });

  it('marks the live input on the curve', () => {
    const { container } = renderSvg(<AxisCurvePlot axis={AXIS} label="Forward" size={SIZE} input={0.6} />);
    const marker = container.querySelector('[data-testid="axis-marker"]')!;
    expect((SIZE / 2 - numberAttr(marker, 'cy')) / HALF).toBeCloseTo(
      shapeAxis(0.6, { low: -1, centre: 0, high: 1 }, AXIS),
      9,
    );
  });

  it('says its settings in words, in percent like the fields beside it', () => {
    renderSvg(<AxisCurvePlot axis={AXIS} label="Yaw" />);
    expect(screen.getByRole('img', { name: /Yaw stick curve/ }).textContent).toContain(
      'deadband 10 % of half travel, expo 50 %, rate 80 %',
    );
  });

  it('shows under the plot what half stick gives, in percent', () => {
    const { container } = renderSvg(<AxisCurvePlot axis={AXIS} label="Yaw" />);
    const half = Math.round(shapeAxis(0.5, { low: -1, centre: 0, high: 1 }, AXIS) * 100);
    expect(container.querySelector('figcaption')!.textContent).toBe(`Yaw: half stick gives +${half}\u00a0%`);
  });
});
