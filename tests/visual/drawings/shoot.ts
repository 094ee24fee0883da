// Screenshots of the drawings harness for a visual check (not a test):
//   MIXWRIGHT_THEME_CSS=/path/to/index.css npx tsx tests/visual/drawings/shoot.ts out-dir "layout=…&part=…" …
// Starts Vite on a free port, shoots each query at 1366×768 (DPR=2 for sharper pixels), and stops the server.
import { shootHarness } from '../shared/shoot-harness';

await shootHarness({
  harness: import.meta.url,
  title: 'Mixwright drawings harness',
  settleMs: 1200,
  // hold=w,e: focus the floor view and hold those keys for a while before the shot.
  beforeShot: async ({ page, params }) => {
    const hold = params.get('hold');
    if (!hold) return;
    await page.focus('[role=application]');
    for (const key of hold.split(',')) await page.keyboard.down(key);
    await page.waitForTimeout(Number(params.get('ms') ?? 2500));
  },
  afterShot: async ({ page, params }) => {
    const hold = params.get('hold');
    if (hold) for (const key of hold.split(',')) await page.keyboard.up(key);
  },
});
