import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export interface Browser {
  context: BrowserContext;
  page: Page;
  /** Messages the page logged as errors, and requests that failed, for assertions and debugging. */
  problems: string[];
  close: () => Promise<void>;
}

/**
 * One person's browser: Debian's Chromium, headless, with a fresh profile. Two people in one
 * test are two of these, so they share no cookies.
 */
export async function openBrowser(
  options: { width?: number; height?: number; deviceScaleFactor?: number } = {},
): Promise<Browser> {
  const profile = mkdtempSync(join(tmpdir(), 'mixwright-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: { width: options.width ?? 1280, height: options.height ?? 860 },
    deviceScaleFactor: options.deviceScaleFactor ?? 1,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  context.setDefaultTimeout(15_000);
  const page = context.pages()[0] ?? (await context.newPage());
  const problems: string[] = [];
  page.on('pageerror', (error) => problems.push(`page error: ${error.message}`));
  page.on('console', (message) => {
    if (message.type() === 'error') problems.push(`console: ${message.text()}`);
  });
  return {
    context,
    page,
    problems,
    close: async () => {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

const screenshotDir = fileURLToPath(new URL('../../../screenshots', import.meta.url));

/** Saves a full-page picture to screenshots/<name>.png (git-ignored) for a person to look at. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(screenshotDir, { recursive: true });
  const path = join(screenshotDir, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}
