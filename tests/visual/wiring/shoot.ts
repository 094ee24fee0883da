// Screenshots of the wiring harness for a visual check (not a test):
//   npx tsx tests/visual/wiring/shoot.ts out-dir "board=uno&assign=1" "board=nano&part=sheet" …
// FULL=1 shoots the whole page; a query with part=sheet is also printed to PDF (A4 and Letter).
// Starts Vite on a free port, shoots each query at 1366×768, and stops the server.
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { shootHarness } from '../shared/shoot-harness';

/** The sheet as PDF on A4 and Letter, and as the printer sees it at A4 width. */
async function printSheet(page: Page, outDir: string, name: string) {
  const margin = process.env.PDF_MARGIN;
  for (const format of ['A4', 'Letter'] as const) {
    const pdf = join(outDir, `${name}-${format}.pdf`);
    await page.pdf({
      path: pdf,
      format,
      printBackground: true,
      ...(margin
        ? { margin: { top: margin, bottom: margin, left: margin, right: margin } }
        : { preferCSSPageSize: true }),
    });
    console.log(pdf);
  }
  // A4 width is 210 mm at 96 px per inch, less 11 mm margins.
  await page.emulateMedia({ media: 'print' });
  await page.setViewportSize({ width: 711, height: 400 });
  const wide = await page.evaluate(() => {
    const limit = document.documentElement.clientWidth;
    return [...document.querySelectorAll('body *')]
      .filter((e) => e.getBoundingClientRect().right > limit + 1)
      .slice(0, 5)
      .map((e) => `${e.tagName}.${e.className}`);
  });
  if (wide.length) console.log('wider than the page:', wide);
  const printed = join(outDir, `${name}-print.png`);
  await page.screenshot({ path: printed, fullPage: true });
  console.log(printed);
  await page.emulateMedia({ media: null });
  await page.setViewportSize({ width: 1366, height: 768 });
}

await shootHarness({
  harness: import.meta.url,
  title: 'Mixwright wiring harness',
  settleMs: 1500,
  beforeShot: async ({ page, params }) => {
    const hover = params.get('hover');
    if (hover) await page.hover(`[data-pin="${hover}"]`);
  },
  afterShot: async ({ page, params, outDir, name }) => {
    if (params.get('part') === 'sheet') await printSheet(page, outDir, name);
  },
});
