import { beforeAll, describe, expect, it } from 'vitest';
import { screenshot } from './support/browser';
import { useRunningApp } from './support/use-running-app';

const e2e = useRunningApp({ builder: { width: 1366, height: 768 } });

beforeAll(() => {
  // Reloading with unsaved changes makes the browser ask; the builder says "leave".
  e2e.builder.page.on('dialog', (dialog) => void dialog.accept());
});

describe('building a robot in the editor', () => {
  it('takes a new builder from sign-up to a saved second revision, with the draft surviving a reload', async () => {
    const page = e2e.builder.page;
    await page.goto(`${e2e.app.url}/sign-up`);
    await page.getByLabel('Your name').fill('Tamsin Wright');
    await page.getByLabel('E-mail').fill('tamsin.wright@example.org');
    await page.getByLabel('Password').fill('omni wheels all the way');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(`${e2e.app.url}/teams`);
    await page.getByLabel('Team name').fill('Quarry Lane Robotics');
    await page.getByRole('button', { name: 'Create team' }).click();
    await page.getByRole('heading', { name: 'Quarry Lane Robotics' }).waitFor();

    // A robot from a starter layout.
    await page.getByRole('button', { name: 'New robot' }).click();
    const dialog = page.getByRole('dialog', { name: 'New robot' });
    await dialog.getByLabel('Robot name').fill('Pebble Sweeper');
    await dialog.getByLabel('Starter layout').selectOption('quad-mecanum');
    await dialog.getByLabel('Board').selectOption('esp32-devkitc');
    await dialog.getByLabel('Input source').selectOption('sbus');
    await dialog.getByLabel('Motor driver').selectOption('pwm-dir');
    await dialog.getByText('Every pin can be placed automatically').waitFor();
    await screenshot(page, 'editor-new-robot');
    await dialog.getByRole('button', { name: 'Create robot' }).click();

    await page.getByRole('heading', { name: 'Pebble Sweeper' }).waitFor();
    await page.waitForURL(/\/robots\/[^/]+\/chassis$/);
    await page.getByText('Head r1').waitFor();
    await page.getByText('No unsaved changes').waitFor();
    await page.getByRole('heading', { name: 'What if a motor were reversed?' }).waitFor();
    await screenshot(page, 'editor-chassis');

    // Chassis: a bigger wheel, from the layout's parameters.
    const radius = page.getByLabel('Wheel radius');
    await radius.fill('48');
    await page.getByText('Unsaved changes on r1').waitFor();
    await expect(
      page.getByRole('table', { name: 'Wheel table' }).getByRole('row').nth(1).textContent(),
    ).resolves.toContain('48');

    // Controls: a wider deadband on the forward stick and one more channel.
    await page
      .getByRole('navigation', { name: 'Robot sections' })
      .getByRole('link', { name: /Controls/ })
      .click();
    const forward = page.getByRole('region', { name: /^Forward/ });
    await forward.getByLabel('Deadband', { exact: true }).fill('7');
    await page.getByRole('button', { name: 'Add channel' }).click();
    await page.getByLabel('Name of channel 3').fill('Horn');
    await page.getByRole('application', { name: 'Floor view: drive with the keyboard' }).waitFor();
    await screenshot(page, 'editor-controls');

    // The draft survives a reload.
    await page.reload();
    await page.getByText('Unsaved changes on r1').waitFor();
    await expect(
      page
        .getByRole('region', { name: /^Forward/ })
        .getByLabel('Deadband', { exact: true })
        .inputValue(),
    ).resolves.toBe('7');
    await expect(page.getByLabel('Name of channel 3').inputValue()).resolves.toBe('Horn');

    await page
      .getByRole('navigation', { name: 'Robot sections' })
      .getByRole('link', { name: /Safety/ })
      .click();
    await page.getByRole('heading', { name: 'Power and protection advice' }).waitFor();
    await screenshot(page, 'editor-safety');

    await page
      .getByRole('navigation', { name: 'Robot sections' })
      .getByRole('link', { name: /Commissioning/ })
      .click();
    await page.getByText('bench motor 1/4 "Front left" forward').waitFor();
    await screenshot(page, 'editor-commissioning');
    // The wheels-up check: the second motor turned the wrong way; the rest were right.
    for (const [i, way] of ['Yes, as shown', 'No, the other way', 'Yes, as shown', 'Yes, as shown'].entries()) {
      if (i > 0) await page.getByRole('button', { name: 'Next motor' }).click();
      await page.getByRole('radio', { name: /The highlighted wheel/ }).check();
      await page.getByRole('radio', { name: way }).check();
    }
    await page.getByText('Flipped Front right').waitFor();
    await screenshot(page, 'editor-commissioning-fix');
    await page.getByRole('button', { name: 'Apply to the draft only' }).click();
    await page.getByText('Put into the draft: flipped Front right.').waitFor();

    await page
      .getByRole('navigation', { name: 'Robot sections' })
      .getByRole('link', { name: /Wiring/ })
      .click();
    await page.getByRole('button', { name: 'Assign free pins' }).waitFor();
    await screenshot(page, 'editor-wiring');

    await page
      .getByRole('navigation', { name: 'Robot sections' })
      .getByRole('link', { name: /All problems/ })
      .click();
    await page.getByRole('heading', { name: 'All problems' }).waitFor();
    await screenshot(page, 'editor-problems');

    // Leaving asks first; staying keeps everything.
    await page.getByRole('link', { name: 'Quarry Lane Robotics' }).click();
    const leave = page.getByRole('dialog', { name: 'Leave with unsaved changes?' });
    await leave.waitFor();
    await leave.getByRole('button', { name: 'Stay' }).click();

    // Save with a message.
    await page.getByRole('button', { name: 'Save…' }).click();
    const save = page.getByRole('dialog', { name: 'Save a new revision' });
    await save.getByText('Chassis › layout wheel radius').waitFor();
    await save.getByText('Chassis › Front right wheel › reversed').waitFor();
    await save.getByLabel('What changed, and why?').fill('Bigger wheels, softer forward stick, horn channel');
    await screenshot(page, 'editor-save-dialog');
    await save.getByRole('button', { name: 'Save revision' }).click();
    await page.getByText('Saved as r2.').waitFor();
    await page.getByText('Head r2').waitFor();
    await page.getByText('No unsaved changes').waitFor();

    // The dashboard shows the new head.
    await page.getByRole('link', { name: 'Quarry Lane Robotics' }).click();
    const row = page.getByRole('row', { name: /Pebble Sweeper/ });
    await row.waitFor();
    await expect(row.textContent()).resolves.toMatch(/Quad mecanum.*ESP32 DevKitC.*r2/);
    await screenshot(page, 'editor-dashboard');

    expect(e2e.builder.problems.filter((p) => !p.includes('401 (Unauthorized)'))).toEqual([]);
  });
});
