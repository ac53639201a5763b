import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, demo, launchBrowser, navSections, openPage, type RunningServer, type Size, shot, signIn, startServer } from './support';

let server: RunningServer;
let browser: Browser;

beforeAll(async () => {
  [server, browser] = await Promise.all([startServer(), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

async function ownerPage(size: Size) {
  const opened = await openPage(browser, server.url, size);
  await signIn(opened.page, demo('owner').email, DEMO_PASSWORD, 'bench');
  return opened;
}

async function sendInvite(page: Page, email: string, roleTestId: string) {
  await page.getByTestId('nav-members').click();
  await page.getByTestId('invite-email').fill(email);
  await page.getByTestId(`invite-role-${roleTestId}`).click();
  await page.getByTestId('invite-submit').click();
  await page.getByTestId('invite-sent').waitFor();
  await page.getByTestId(`invite-${email}`).waitFor();
}

/** Opens the newest mail to `to` in the outbox and returns the link it carries. */
async function linkInOutbox(page: Page, size: Size, to: string, shotName: string) {
  await page.getByTestId('nav-outbox').click();
  await page.getByTestId('mail-list').waitFor();
  await shot(page, size, `${shotName}-list`);
  await page.getByRole('button', { name: new RegExp(`to ${to}`) }).first().click();
  await page.getByTestId('mail-message').waitFor();
  await shot(page, size, `${shotName}-message`);
  return (await page.getByTestId('mail-link').first().getAttribute('href'))!;
}

describe('inviting a member', () => {
  it.each([
    ['desk', 'phone', 'apprentice', 'sol@harrowlane.example', 'Sol Haddad'],
    ['phone', 'desk', 'tech', 'kit@harrowlane.example', 'Kit Amari'],
  ] as const)(
    'owner on %s invites; the invitee follows the mailed link on %s and lands signed in as %s',
    async (ownerSize, inviteeSize, role, email, name) => {
      const owner = await ownerPage(ownerSize);
      await sendInvite(owner.page, email, role);
      await shot(owner.page, ownerSize, 'members-invite-sent', owner.page.getByTestId(`invite-${email}`));

      const link = await linkInOutbox(owner.page, ownerSize, email, 'outbox-invite');
      expect(link).toMatch(/\/invite\?token=/);
      await owner.context.close();

      const invitee = await openPage(browser, server.url, inviteeSize);
      await invitee.page.goto(link);
      await invitee.page.getByTestId('invite-offer').waitFor();
      const offer = await invitee.page.getByTestId('invite-screen').textContent();
      expect(offer).toContain('Join Harrow Lane Motor Works');
      expect(offer).toContain(email);
      await shot(invitee.page, inviteeSize, 'invite');

      await invitee.page.getByTestId('invite-name').fill(name);
      await invitee.page.getByTestId('invite-password').fill('a fresh pass 1');
      await invitee.page.getByTestId('invite-accept').click();
      const landing = role === 'apprentice' ? 'replays' : 'bench';
      await invitee.page.waitForURL(`**/${landing}`);
      expect(await navSections(invitee.page)).toEqual(role === 'apprentice' ? ['replays'] : ['bench', 'replays']);
      await invitee.page.getByTestId('nav-account').click();
      expect(await invitee.page.getByTestId('account-card').textContent()).toContain(name);

      // The link works once.
      await invitee.page.goto(link);
      await invitee.page.getByTestId('form-error').waitFor();
      expect(await invitee.page.getByTestId('invite-screen').textContent()).toContain("This invite can't be used");
      await shot(invitee.page, inviteeSize, 'invite-used');
      await invitee.context.close();
    },
  );

  it('an invite already sent to a member is refused in words, and a pending invite can be revoked', async () => {
    const { context, page } = await ownerPage('desk');
    await page.getByTestId('nav-members').click();
    await page.getByTestId('invite-email').fill(demo('tech').email);
    await page.getByTestId('invite-submit').click();
    await page.getByTestId('form-error').waitFor();
    expect(await page.getByTestId('invite-form').textContent()).toContain('already has a Probepath account');
    await shot(page, 'desk', 'members-invite-refused', page.getByTestId('invite-submit'));

    await sendInvite(page, 'ash@harrowlane.example', 'lead');
    await page.getByTestId('revoke-ash@harrowlane.example').click();
    await page.getByTestId('invite-ash@harrowlane.example').waitFor({ state: 'detached' });
    await context.close();
  });
});

describe('managing members', () => {
  it.each(['desk', 'phone'] as const)('on %s the owner changes a role, deactivates after a confirm, and reactivates', async (size) => {
    const { context, page } = await ownerPage(size);
    await page.getByTestId('nav-members').click();
    const tomas = demo('tech');
    await page.getByTestId(`manage-${tomas.email}`).click();
    await page.getByTestId('member-role-lead').click();
    const row = size === 'desk' ? page.getByRole('row', { name: new RegExp(tomas.name) }) : page.getByTestId(`member-card-${tomas.email}`);
    // The picker shows the role the server now holds for the member.
    await expect.poll(() => page.getByTestId('member-role-lead').getAttribute('aria-pressed')).toBe('true');
    expect(await row.textContent()).toContain('Lead technician');
    await shot(page, size, 'members-manage', page.getByTestId('member-deactivate'));

    await page.getByTestId('member-deactivate').click();
    await page.getByTestId('member-deactivate-confirm').waitFor();
    await shot(page, size, 'members-deactivate-confirm', page.getByTestId('member-deactivate-yes'));
    await page.getByTestId('member-deactivate-yes').click();
    await expect.poll(() => row.textContent()).toContain('Deactivated');

    // A deactivated member is turned away at sign-in with the reason.
    const other = await openPage(browser, server.url, size);
    await other.page.goto('/sign-in');
    await other.page.getByTestId('sign-in-email').fill(tomas.email);
    await other.page.getByTestId('sign-in-password').fill(DEMO_PASSWORD);
    await other.page.getByTestId('sign-in-submit').click();
    await other.page.getByTestId('form-error').waitFor();
    expect(await other.page.getByTestId('form-error').textContent()).toContain('deactivated');
    await other.context.close();

    await page.getByTestId('member-reactivate').click();
    await expect.poll(() => row.textContent()).toContain('Active');
    await page.getByTestId('member-role-tech').click();
    await expect.poll(() => page.getByTestId('member-role-tech').getAttribute('aria-pressed')).toBe('true');
    await context.close();
  });

  it('the only owner cannot demote themselves; the reason is shown', async () => {
    const { context, page } = await ownerPage('desk');
    await page.getByTestId('nav-members').click();
    await page.getByTestId(`manage-${demo('owner').email}`).click();
    await page.getByTestId('member-role-tech').click();
    await page.getByTestId('form-error').waitFor();
    expect(await page.getByTestId('form-error').textContent()).toContain('at least one active owner');
    await shot(page, 'desk', 'members-last-owner');
    await context.close();
  });
});
