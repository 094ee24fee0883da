import { render } from '@testing-library/react';
import type { ReactElement } from 'react';

/** Numeric data-* attribute of an element. */
export function numberAttr(element: Element, name: string): number {
  const value = element.getAttribute(name);
  if (value === null) throw new Error(`Element has no ${name}`);
  return Number(value);
}

/** Renders and returns the first <svg> in the result. */
export function renderSvg(ui: ReactElement): { svg: SVGSVGElement; container: HTMLElement } {
  const { container } = render(ui);
  const svg = container.querySelector('svg');
  if (!svg) throw new Error('No svg rendered');
  return { svg, container };
}

/** Rotates a vector by an SVG angle (degrees, clockwise on screen). */
export function rotateSvg(x: number, y: number, deg: number): { x: number; y: number } {
  const a = (deg * Math.PI) / 180;
  return { x: x * Math.cos(a) - y * Math.sin(a), y: x * Math.sin(a) + y * Math.cos(a) };
}
