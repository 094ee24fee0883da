import { describe, expect, it } from 'vitest';
import { screenshot } from './support/browser';
import { useRunningApp } from './support/use-running-app';

const e2e = useRunningApp({ founder: {}, guest: {} });

const GUEST_EMAIL = 'wren.guest@example.org';

describe('inviting someone to a team', () => {
  it('takes a new person from sign-up to a team, and a guest from the passed-on link to viewer', async () => {
    const page = e2e.founder.page;
    await page.goto(`${e2e.app.url}/sign-up`);
    await page.getByLabel('Your name').fill('Orla Founder');
    await page.getByLabel('E-mail').fill('orla.founder@example.org');
    await page.getByLabel('Password').fill('gears and sprockets');
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL(`${e2e.app.url}/teams`);
    await page.getByText('You are not in a team yet').waitFor();
    await screenshot(page, 'e2e-teams-empty');

    await page.getByLabel('Team name').fill('Hilltop Rover Club');
    await page.getByRole('button', { name: 'Create team' }).click();
    await page.getByRole('heading', { name: 'Hilltop Rover Club' }).waitFor();
    await page.getByText('No robots in this team yet').waitFor();
    await expect(page.getByRole('complementary', { name: 'Before the wheels turn' }).isVisible()).resolves.toBe(true);
    await screenshot(page, 'e2e-team-dashboard');

    // The test server has no outgoing mail server: the owner is told so, and passes the link on.
    await page.getByRole('link', { name: 'People' }).click();
    await page.getByText('Invitations are not e-mailed from this Mixwright.').waitFor();
    await page.getByLabel('E-mail address').fill(GUEST_EMAIL);
    await page.getByLabel('Role', { exact: true }).selectOption('viewer');
    await page.getByRole('button', { name: 'Create invitation link' }).click();
    const link = await page.getByLabel(`Invitation link for ${GUEST_EMAIL}`).inputValue();
    expect(link).toMatch(new RegExp(`^${e2e.app.url}/invitations/[A-Za-z0-9_-]{43}$`));
    await page.getByRole('cell', { name: GUEST_EMAIL, exact: true }).waitFor();
    await screenshot(page, 'e2e-team-people-invited');

    const g = e2e.guest.page;
    await g.goto(link);
    await g.getByRole('heading', { name: 'Join Hilltop Rover Club' }).waitFor();
    await screenshot(g, 'e2e-invitation');

    await g.getByRole('link', { name: 'Create an account to accept' }).click();
    await expect(g.getByLabel('E-mail').inputValue()).resolves.toBe(GUEST_EMAIL);
    await g.getByLabel('Your name').fill('Wren Guest');
    await g.getByLabel('Password').fill('visiting the workshop');
    await g.getByLabel('Password').press('Enter');
    await g.getByRole('button', { name: 'Accept and open the team' }).click();

    await g.getByRole('heading', { name: 'Hilltop Rover Club' }).waitFor();
    await g.getByText(/Your role\s*viewer/).waitFor();
    await g.getByRole('link', { name: 'People' }).click();
    await g
      .getByRole('row', { name: /Wren Guest/ })
      .getByText('viewer', { exact: true })
      .waitFor();
    await expect(g.getByRole('button', { name: 'Create invitation link' }).count()).resolves.toBe(0);
    await screenshot(g, 'e2e-guest-people');

    // The founder sees the guest as a viewer too.
    await page.reload();
    await expect(page.getByLabel('Role of Wren Guest').inputValue()).resolves.toBe('viewer');

    const unexpected = [...e2e.founder.problems, ...e2e.guest.problems].filter(
      (p) => !p.includes('401 (Unauthorized)'),
    );
    expect(unexpected).toEqual([]);
  });
});
