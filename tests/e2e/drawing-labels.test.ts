import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { useRunningApp } from './support/use-running-app';
import { signUpWithRobot } from './support/new-builder';

const e2e = useRunningApp({ builder: { width: 1280, height: 720 } });

/** Every wheel label of every chassis drawing on the page that the browser draws past the drawing's edge. */
async function clippedLabels(page: Page): Promise<string[]> {
  return page.$$eval('svg[data-scale]', (drawings) =>
    drawings.flatMap((svg) => {
      const [, , width, height] = svg.getAttribute('viewBox')!.split(' ').map(Number);
      return [...svg.querySelectorAll('text')]
        .filter((text) => text.querySelector('tspan'))
        .filter((text) => {
          const b = text.getBBox();
          return b.x < 0 || b.y < 0 || b.x + b.width > width || b.y + b.height > height;
        })
        .map(
          (text) =>
            `${svg.querySelector('title')?.textContent}: ${[...text.querySelectorAll('tspan')].map((t) => t.textContent).join(' / ')}`,
        );
    }),
  );
}

describe('wheel labels in the drawings', () => {
  it('stay inside every drawing when the motors have long names of their own', async () => {
    const page = e2e.builder.page;
    await signUpWithRobot(page, e2e.app.url, {
      name: 'Ines Marlow',
      email: 'ines.marlow@example.org',
      team: 'Weir Street Robotics',
      robot: 'Long Reach',
      layout: 'quad-mecanum',
    });

    for (const [i, wheel] of ['Front left', 'Front right', 'Rear right', 'Rear left'].entries()) {
      const name = page.getByLabel(`Name of motor ${wheel}`);
      await name.fill(`M${i + 1} ${wheel.toLowerCase()} gearmotor, 12 V 300 rpm`);
      await name.press('Enter');
    }
    await page.getByLabel('Name of motor M4 rear left gearmotor, 12 V 300 rpm').waitFor();
    await page.getByRole('heading', { name: 'What if a motor were reversed?' }).waitFor();
    expect(await page.locator('svg[data-scale]').count()).toBeGreaterThanOrEqual(2);
    expect(await clippedLabels(page)).toEqual([]);

    await page
      .getByRole('navigation', { name: 'Robot sections' })
      .getByRole('link', { name: /Commissioning/ })
      .click();
    await page.waitForURL(/\/commissioning$/);
    await page.locator('svg[data-scale]').first().waitFor();
    expect(await page.locator('svg[data-scale]').count()).toBeGreaterThanOrEqual(3);
    expect(await clippedLabels(page)).toEqual([]);
  });
});
