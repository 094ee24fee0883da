import { screen } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { computeMixing, mixSticks } from '@shared/kinematics/mixing';
import { DRIVE_LAYOUT_IDS } from '@shared/schemas/ids';
import { estimateTextWidth, labelRoom } from '@/features/robot-editor/lib/wheel-labels';
import { ChassisDrawing } from '@/features/robot-editor/components/chassis-drawing';
import { makeConfig } from '../../../factories/engine';
import { numberAttr, renderSvg, rotateSvg } from './factories';

const WIDTH = 480;
const HEIGHT = 440;

function drawWheels(layout: Parameters<typeof makeConfig>[0], change?: Parameters<typeof makeConfig>[1]) {
  const config = makeConfig(layout, change);
  const { svg, container } = renderSvg(<ChassisDrawing wheels={config.chassis.wheels} width={WIDTH} height={HEIGHT} />);
  const wheel = (name: string) => container.querySelector(`[data-testid="wheel-${name}"]`)!;
  return { config, svg, container, wheel, scale: numberAttr(svg, 'data-scale') };
}

describe('the chassis drawing', () => {
  it('puts the lone front wheel of a trio straight above the centre, driving to the right', () => {
    const { wheel, scale } = drawWheels('trio-omni');
    const front = wheel('Front');
    // Body (120, 0) mm: forward is up on screen, so the wheel sits 120 mm above the centre line.
    expect(numberAttr(front, 'data-cx')).toBeCloseTo(WIDTH / 2, 9);
    const centreY = numberAttr(wheel('Rear left'), 'data-cy') - 60 * scale;
    expect(numberAttr(front, 'data-cy')).toBeCloseTo(centreY - 120 * scale, 9);
    // β = −90° (pushes right): on screen its long side points along +x, rotation 0.
    expect(numberAttr(front, 'data-angle')).toBeCloseTo(0, 9);
    expect(front.getAttribute('transform')).toMatch(/rotate\(0\)$/);
  });

  it('draws the trio’s rear-left wheel below-left of the centre, pushing 30° left of forward', () => {
    const { wheel, scale } = drawWheels('trio-omni');
    const rearLeft = wheel('Rear left');
    const front = wheel('Front');
    const cx = numberAttr(front, 'data-cx');
    const cy = numberAttr(front, 'data-cy') + 120 * scale;
    // Body (120·cos 120°, 120·sin 120°) = (−60, 103.9) mm → screen (−103.9, +60) mm from the centre.
    expect(numberAttr(rearLeft, 'data-cx')).toBeCloseTo(cx - 120 * Math.sin((2 * Math.PI) / 3) * scale, 9);
    expect(numberAttr(rearLeft, 'data-cy')).toBeCloseTo(cy + 60 * scale, 9);
    const push = rotateSvg(1, 0, numberAttr(rearLeft, 'data-angle'));
    // 30° left of forward: mostly up (−y) and a little left (−x).
    expect(push.x).toBeCloseTo(-Math.sin(Math.PI / 6), 9);
    expect(push.y).toBeCloseTo(-Math.cos(Math.PI / 6), 9);
  });

  it('draws a scale bar whose length is its label at the drawing’s scale', () => {
    const { container, scale } = drawWheels('differential');
    const bar = container.querySelector('[data-testid="scale-bar"]')!;
    const mm = numberAttr(bar, 'data-length-mm');
    const widths = [...bar.querySelectorAll('rect')].reduce((sum, r) => sum + Number(r.getAttribute('width')), 0);
    expect(widths).toBeCloseTo(mm * scale, 9);
    expect(bar.textContent).toContain(`${mm} mm`);
  });

  it('keeps wheels to scale: a 200 mm track width is 200 mm of scale bar apart', () => {
    const { wheel, container } = drawWheels('differential');
    const bar = container.querySelector('[data-testid="scale-bar"]')!;
    const perMm = numberAttr(bar, 'data-length') / numberAttr(bar, 'data-length-mm');
    const apart = numberAttr(wheel('Right'), 'data-cx') - numberAttr(wheel('Left'), 'data-cx');
    expect(apart).toBeCloseTo(200 * perMm, 9);
  });

  it('turns the driving arrow round on a reversed wheel', () => {
    const { container } = drawWheels('differential', (c) => (c.chassis.wheels[1].reversed = true));
    expect(container.querySelector('[data-testid="drive-arrow-Left"]')!.getAttribute('data-direction')).toBe('1');
    expect(container.querySelector('[data-testid="drive-arrow-Right"]')!.getAttribute('data-direction')).toBe('-1');
  });

  it('draws the top rollers of the X pattern’s front-left wheel along the line to the centre', () => {
    const { wheel } = drawWheels('quad-mecanum');
    const frontLeft = wheel('Front left');
    const angle = numberAttr(frontLeft, 'data-angle');
    const line = frontLeft.querySelector('line')!;
    const local = {
      x: Number(line.getAttribute('x2')) - Number(line.getAttribute('x1')),
      y: Number(line.getAttribute('y2')) - Number(line.getAttribute('y1')),
    };
    const onScreen = rotateSvg(local.x, local.y, angle);
    // The wheel is up-left of the centre; an X roller runs up-left to down-right: dx and dy share a sign.
    expect(Math.abs(onScreen.x)).toBeCloseTo(Math.abs(onScreen.y), 6);
    expect(Math.sign(onScreen.x)).toBe(Math.sign(onScreen.y));
  });

  it('has an accessible name and a description of every wheel', () => {
    const config = makeConfig('quad-mecanum');
    renderSvg(<ChassisDrawing wheels={config.chassis.wheels} title="Aisle Scout, top view" />);
    const img = screen.getByRole('img', { name: /Aisle Scout, top view/ });
    expect(img.textContent).toContain(
      'Front left (motor Front left): mecanum wheel, 40 mm radius, 80 mm ahead of and 95 mm left of the centre',
    );
  });

  it('shows each wheel turning the way a strafe command makes it', () => {
    const config = makeConfig('quad-mecanum');
    const mixing = computeMixing(config);
    const commands = mixSticks(mixing, { forward: 0, strafe: 1, yaw: 0 });
    const byMotor = Object.fromEntries(mixing.motors.map((m, i) => [m, commands[i]]));
    const { container } = renderSvg(<ChassisDrawing wheels={config.chassis.wheels} motorCommands={byMotor} />);
    const push = (name: string) =>
      container.querySelector(`[data-testid="command-${name}"]`)!.getAttribute('data-push');
    expect([push('Front left'), push('Front right'), push('Rear right'), push('Rear left')]).toEqual([
      '1',
      '-1',
      '1',
      '-1',
    ]);
  });
});

describe('the chassis drawing’s wheel labels', () => {
  /** Motors named apart from their wheels, and long: "M2 front right gearmotor, 12 V 300 rpm". */
  const longNames = (layout: (typeof DRIVE_LAYOUT_IDS)[number]) =>
    makeConfig(layout, (c) => {
      c.chassis.wheels = c.chassis.wheels.map((w, i) => ({
        ...w,
        motor: `M${i + 1} ${w.name.toLowerCase()} gearmotor, 12 V 300 rpm`,
      }));
    }).chassis.wheels;

  // Each label's extent from what is drawn: its anchor, first baseline and lines, with the text
  // widths estimated as the drawing does (the browser test checks the estimate against Chromium).
  const boxes = (container: HTMLElement) =>
    [...container.querySelectorAll('text')]
      .filter((text) => text.querySelector('tspan'))
      .map((text) => {
        const lines = [...text.querySelectorAll('tspan')].map((t) =>
          estimateTextWidth(t.textContent ?? '', 12, t.getAttribute('font-weight') === '600'),
        );
        const width = Math.max(...lines);
        const x = numberAttr(text, 'x');
        const y = numberAttr(text, 'y');
        const anchor = text.getAttribute('text-anchor');
        const left = anchor === 'start' ? x : anchor === 'end' ? x - width : x - width / 2;
        return {
          text: text.textContent,
          left,
          right: left + width,
          top: y - 11,
          bottom: y + (lines.length - 1) * 14 + 4,
        };
      });

  describe.each([
    [480, 440],
    [420, 400],
    [420, 380],
  ])('at %i × %i', (width, height) => {
    it.each(DRIVE_LAYOUT_IDS)(
      'keeps every label of a %s inside the drawing, clear of the forward mark and the scale bar',
      (layout) => {
        const wheels = longNames(layout);
        const commands = Object.fromEntries(wheels.map((w) => [w.motor, -1]));
        const { svg, container } = renderSvg(
          <ChassisDrawing wheels={wheels} motorCommands={commands} width={width} height={height} />,
        );
        expect(svg.getAttribute('viewBox')).toBe(`0 0 ${width} ${height}`);
        const { inside, keepOut } = labelRoom(width, height);
        const labels = boxes(container);
        expect(labels).toHaveLength(wheels.length);
        for (const box of labels) {
          expect(box.left, `${box.text} runs off the left`).toBeGreaterThanOrEqual(inside.left);
          expect(box.right, `${box.text} runs off the right`).toBeLessThanOrEqual(inside.right);
          expect(box.top, `${box.text} runs off the top`).toBeGreaterThanOrEqual(inside.top);
          expect(box.bottom, `${box.text} runs into the scale bar`).toBeLessThanOrEqual(inside.bottom);
          for (const k of keepOut)
            expect(
              box.right <= k.left || box.left >= k.right || box.bottom <= k.top || box.top >= k.bottom,
              `${box.text} covers the forward mark`,
            ).toBe(true);
        }
      },
    );
  });

  it('draws the robot smaller to make room for long names, and at full size for short ones', () => {
    const short = renderSvg(<ChassisDrawing wheels={makeConfig('quad-mecanum').chassis.wheels} />);
    const long = renderSvg(<ChassisDrawing wheels={longNames('quad-mecanum')} />);
    expect(numberAttr(long.svg, 'data-scale')).toBeLessThan(numberAttr(short.svg, 'data-scale'));
    expect(numberAttr(long.svg, 'data-scale')).toBeGreaterThan(0.4 * numberAttr(short.svg, 'data-scale'));
  });

  it('shows a long motor name whole, over several lines, with the wheel’s own name beneath', () => {
    const wheels = longNames('trio-omni');
    const { container } = renderSvg(<ChassisDrawing wheels={wheels} />);
    const front = [...container.querySelectorAll('text')].find((t) => t.textContent?.includes('wheel Front'))!;
    const lines = [...front.querySelectorAll('tspan')].map((t) => t.textContent);
    expect(lines.length).toBeGreaterThan(2);
    expect(lines.slice(0, -1).join(' ')).toBe(wheels[0].motor);
    expect(lines.at(-1)).toBe('wheel Front');
  });
});
