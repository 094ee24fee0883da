import type { Page } from 'playwright-core';

export interface NewBuilder {
  name: string;
  email: string;
  team: string;
  robot: string;
  layout: string;
}

/** Signs a new builder up, makes their team and one robot from a starter layout; ends in the robot's Chassis section. */
export async function signUpWithRobot(page: Page, appUrl: string, who: NewBuilder): Promise<void> {
  await page.goto(`${appUrl}/sign-up`);
  await page.getByLabel('Your name').fill(who.name);
  await page.getByLabel('E-mail').fill(who.email);
  await page.getByLabel('Password').fill('a long enough test password');
  await page.getByRole('button', { name: 'Create account' }).click();
  await page.waitForURL(`${appUrl}/teams`);
  await page.getByLabel('Team name').fill(who.team);
  await page.getByRole('button', { name: 'Create team' }).click();
  await page.getByRole('button', { name: 'New robot' }).click();
  const dialog = page.getByRole('dialog', { name: 'New robot' });
  await dialog.getByLabel('Robot name').fill(who.robot);
  await dialog.getByLabel('Starter layout').selectOption(who.layout);
  await dialog.getByRole('button', { name: 'Create robot' }).click();
  await page.waitForURL(/\/robots\/[^/]+\/chassis$/);
}
