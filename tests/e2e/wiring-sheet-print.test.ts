import { describe, expect, it } from 'vitest';
import { useRunningApp } from './support/use-running-app';
import { signUpWithRobot } from './support/new-builder';

const e2e = useRunningApp({ builder: { width: 1280, height: 720 } });

const pagesOf = (pdf: Buffer) => (pdf.toString('latin1').match(/\/Type\s*\/Page(?!s)/g) ?? []).length;

describe('the printed wiring sheet', () => {
  it('fits a four-motor robot with two drivers on one page of A4 and one of Letter', async () => {
    const page = e2e.builder.page;
    await signUpWithRobot(page, e2e.app.url, {
      name: 'Tova Brennan',
      email: 'tova.brennan@example.org',
      team: 'Lock Keepers',
      robot: 'Four Square',
      layout: 'skid-steer',
    });
    const robotPath = new URL(page.url()).pathname.replace(/\/chassis$/, '');
    await page.goto(`${e2e.app.url}${robotPath}/wiring-sheet`);
    await page
      .getByRole('table', { name: /Pins on the/ })
      .first()
      .waitFor();
    expect(await page.getByRole('row').count()).toBeGreaterThan(20);
    await page.emulateMedia({ media: 'print' });
    expect(pagesOf(await page.pdf({ format: 'A4' }))).toBe(1);
    expect(pagesOf(await page.pdf({ format: 'Letter' }))).toBe(1);
  });
});
