import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { startApp, type RunningApp } from './support/app-server';
import { openBrowser, screenshot, type Browser } from './support/browser';

// A club laptop: the student lead edits a robot and signs out, then the visiting parent signs in
// on the same browser. Nothing the first person typed may reach the second.

let app: RunningApp;
let laptop: Browser;
let editorPath: string;

beforeAll(async () => {
  app = await startApp({ client: inject('clientDir'), seed: true });
  laptop = await openBrowser();
  const robot = app.database.sqlite
    .prepare("select id, team_id as teamId from robots where name = 'Greenhouse Cart'")
    .get() as { id: string; teamId: string };
  editorPath = `/teams/${robot.teamId}/robots/${robot.id}/safety`;
});

afterAll(async () => {
  await laptop?.close();
  await app?.close();
});

async function signIn(page: Page, role: 'editor' | 'viewer'): Promise<void> {
  const account = app.demoAccounts.find((a) => a.role === role)!;
  await page.goto(`${app.url}/sign-in`);
  await page.getByLabel('E-mail').fill(account.email);
  await page.getByLabel('Password').fill(account.password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL(`${app.url}/teams`);
}

const draftKeys = (page: Page) =>
  page.evaluate(() => Object.keys(localStorage).filter((key) => key.startsWith('mixwright:draft:')));

describe('one browser shared by two people', () => {
  it('warns about the unsaved draft, deletes it on sign-out and lands on the sign-in page', async () => {
    const page = laptop.page;
    await signIn(page, 'editor');
    await page.goto(`${app.url}${editorPath}`);
    const failsafe = page.getByLabel('Failsafe after');
    await failsafe.fill('777');
    await page.getByText(/Unsaved changes on r\d+/).waitFor();
    expect(await draftKeys(page)).toHaveLength(1);

    await page.getByRole('button', { name: 'Sign out' }).click();
    const warning = page.getByRole('dialog', { name: 'Sign out and delete unsaved drafts?' });
    await warning.getByText('Greenhouse Cart').waitFor();
    await screenshot(page, 'sign-out-unsaved-drafts');
    await warning.getByRole('button', { name: 'Delete the drafts and sign out' }).click();

    await page.waitForURL(`${app.url}/sign-in`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await expect(page.getByText('Sign in to continue').count()).resolves.toBe(0);
    expect(await draftKeys(page)).toEqual([]);
  });

  it('shows the next person the saved revision, not the values the last one typed', async () => {
    const page = laptop.page;
    await signIn(page, 'viewer');
    await page.goto(`${app.url}${editorPath}`);
    const failsafe = page.getByLabel('Failsafe after');
    await failsafe.waitFor();
    await expect(failsafe.inputValue()).resolves.not.toBe('777');
    await expect(page.getByText(/Unsaved changes/).count()).resolves.toBe(0);
    await screenshot(page, 'shared-computer-viewer');
  });

  it('signs out without a question when nothing is unsaved', async () => {
    const page = laptop.page;
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL(`${app.url}/sign-in`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
  });
});
