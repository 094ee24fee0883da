import { readFile } from 'node:fs/promises';
import JSZip from 'jszip';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { screenshot } from './support/browser';
import { useRunningApp } from './support/use-running-app';

const e2e = useRunningApp({ builder: { width: 1366, height: 768 } });

const section = (page: Page, name: string) =>
  page
    .getByRole('navigation', { name: 'Robot sections' })
    .getByRole('link', { name: new RegExp(`^${name}`) })
    .click();

describe('from sign-up to a downloaded firmware bundle', () => {
  it('builds a robot from a starter layout, sets its sticks and pins, saves it and downloads its firmware', async () => {
    const page = e2e.builder.page;

    // A new builder and a team.
    await page.goto(`${e2e.app.url}/sign-up`);
    await page.getByLabel('Your name').fill('Ines Marlow');
    await page.getByLabel('E-mail').fill('ines.marlow@example.org');
    await page.getByLabel('Password').fill('three wheels at 120 degrees');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(`${e2e.app.url}/teams`);
    await page.getByLabel('Team name').fill('Larkspur Makers Club');
    await page.getByRole('button', { name: 'Create team' }).click();
    await page.getByRole('heading', { name: 'Larkspur Makers Club' }).waitFor();

    // A robot from the trio omni starter layout on a Nano with a PPM receiver.
    await page.getByRole('button', { name: 'New robot' }).click();
    const dialog = page.getByRole('dialog', { name: 'New robot' });
    await dialog.getByLabel('Robot name').fill('Greenhouse Cart');
    await dialog.getByLabel('Starter layout').selectOption('trio-omni');
    await dialog.getByLabel('Board').selectOption('nano');
    await dialog.getByLabel('Input source').selectOption('ppm');
    await dialog.getByLabel('Motor driver').selectOption('pwm-in1-in2-stby');
    await dialog.getByText('Every pin can be placed automatically').waitFor();
    await dialog.getByRole('button', { name: 'Create robot' }).click();
    await page.waitForURL(/\/robots\/[^/]+\/chassis$/);
    await page.getByText('Head r1').waitFor();
    await page.getByRole('heading', { name: 'What if a motor were reversed?' }).waitFor();
    await screenshot(page, 'flow-01-chassis');

    // Controls: the sticks. Yaw reads backwards on this transmitter; a little deadband and expo.
    await section(page, 'Controls');
    const yaw = page.getByRole('region', { name: /^Yaw/ });
    await yaw.getByLabel('Reverse').check();
    await yaw.getByLabel('Deadband', { exact: true }).fill('6');
    await yaw.getByLabel('Expo', { exact: true }).fill('30');
    const forward = page.getByRole('region', { name: /^Forward/ });
    await forward.getByLabel('Expo', { exact: true }).fill('20');
    await page.getByText('Unsaved changes on r1').waitFor();
    await screenshot(page, 'flow-02-controls');

    // Wiring: put channel B's PWM on channel A's pin by mistake, see the clash, then undo it.
    await section(page, 'Wiring');
    const driver = page.getByRole('article').first();
    const pwmA = driver.getByRole('region', { name: 'Channel A' }).getByLabel('PWM', { exact: true });
    const pwmB = driver.getByRole('region', { name: 'Channel B' }).getByLabel('PWM', { exact: true });
    const pinA = await pwmA.inputValue();
    const pinB = await pwmB.inputValue();
    expect(pinA).not.toBe('');
    await pwmB.selectOption(pinA);
    await expect.poll(() => pwmB.getAttribute('aria-invalid')).toBe('true');
    const clash = page
      .getByRole('region', { name: /Wiring problems/ })
      .getByText(new RegExp(`^${pinA} is used for .*A PWM and .*B PWM`));
    await clash.waitFor();
    await screenshot(page, 'flow-03-wiring-clash');
    await pwmB.selectOption(pinB);
    await expect.poll(() => pwmB.getAttribute('aria-invalid')).toBeNull();
    await clash.waitFor({ state: 'detached' });
    await screenshot(page, 'flow-04-wiring');

    await section(page, 'Safety');
    await page.getByRole('heading', { name: 'Power and protection advice' }).waitFor();
    await screenshot(page, 'flow-05-safety');
    await section(page, 'Commissioning');
    await page.getByText(/bench motor 1\/3/).waitFor();
    await screenshot(page, 'flow-06-commissioning');

    // The firmware of the unsaved draft, before saving.
    await section(page, 'Firmware');
    await page.getByText('Showing the firmware of your unsaved changes').waitFor();
    await page.getByText(/boot robot="Greenhouse Cart" revision=2 /).waitFor();
    await screenshot(page, 'flow-07-firmware-draft');

    // Save with a message.
    await page.getByRole('button', { name: 'Save…' }).click();
    const save = page.getByRole('dialog', { name: 'Save a new revision' });
    await save.getByLabel('What changed, and why?').fill('Yaw reversed, softer sticks');
    await save.getByRole('button', { name: 'Save revision' }).click();
    await page.getByText('Saved as r2.').waitFor();
    await page.getByText('Head r2').waitFor();

    // The saved revision's firmware: files, compile check, download.
    await page.getByText('Revision 2 as saved.').waitFor();
    const tree = page.getByRole('navigation', { name: 'Files in the bundle' });
    await tree.getByRole('button', { name: /^mw_config\.h/ }).click();
    await page.getByLabel('Contents of greenhouse_cart/mw_config.h').getByText('#define MW_REVISION 2UL').waitFor();
    await page.getByRole('button', { name: 'Check that it compiles' }).click();
    await page.getByRole('meter', { name: 'Flash used' }).waitFor({ timeout: 120_000 });
    await screenshot(page, 'flow-08-firmware');

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Download revision 2 (.zip)' }).click(),
    ]);
    expect(download.suggestedFilename()).toBe('greenhouse-cart-r2.zip');
    const zip = await JSZip.loadAsync(await readFile((await download.path())!));
    expect(zip.file('greenhouse_cart/greenhouse_cart.ino')).not.toBeNull();
    const header = await zip.file('greenhouse_cart/mw_config.h')!.async('string');
    expect(header).toContain('#define MW_REVISION 2UL');
    expect(header).toContain('#define MW_ROBOT_NAME "Greenhouse Cart"');

    // The boot line the Firmware section shows is the one History recognises as this revision.
    const bootLine = (await page.getByText(/^boot robot="Greenhouse Cart" revision=2 /).textContent())!;
    await section(page, 'History');
    await page.getByLabel('Boot line from the serial monitor').fill(bootLine);
    await page.getByRole('button', { name: 'Which revision is this?' }).click();
    await page.getByRole('status').filter({ hasText: 'r2' }).getByText('head', { exact: true }).waitFor();
    await screenshot(page, 'flow-09-history');

    expect(e2e.builder.problems.filter((p) => !p.includes('401 (Unauthorized)'))).toEqual([]);
  });
});
