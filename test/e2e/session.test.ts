import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, apiAs, demo, launchBrowser, openPage, type RunningServer, SIZES, type Size, shot, signIn, startServer } from './support';

let server: RunningServer;
let browser: Browser;

beforeAll(async () => {
  [server, browser] = await Promise.all([startServer(), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe.each(Object.keys(SIZES) as Size[])('at %s size', (size) => {
  it('a signed-out visitor is sent to sign-in; a wrong password is refused in words', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await page.goto('/members');
    await page.waitForURL('**/sign-in');
    await shot(page, size, 'sign-in');

    await page.getByTestId('sign-in-submit').click();
    await page.getByText('Enter your e-mail address.').waitFor();
    await shot(page, size, 'sign-in-empty');

    await page.getByTestId('sign-in-email').fill(demo('lead').email);
    await page.getByTestId('sign-in-password').fill('not the password');
    await page.getByTestId('sign-in-submit').click();
    await page.getByTestId('form-error').waitFor();
    expect(await page.getByTestId('form-error').textContent()).toContain('do not match');
    await shot(page, size, 'sign-in-wrong-password');
    await context.close();
  });

  it('sign-out returns to sign-in, forgets the token, and a reload stays signed out', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('lead').email, DEMO_PASSWORD, 'bench');
    await page.reload();
    await page.getByTestId('bench-screen').waitFor();

    if (size === 'desk') {
      await page.getByTestId('sign-out').click();
    } else {
      await page.getByTestId('nav-account').click();
      await page.getByTestId('account-sign-out').click();
    }
    await page.waitForURL('**/sign-in');
    expect(await page.evaluate(() => Object.keys(localStorage))).toEqual([]);
    await page.reload();
    await page.getByTestId('sign-in-screen').waitFor();
    await page.goto('/bench');
    await page.waitForURL('**/sign-in');
    await context.close();
  });

  it('a session the server no longer accepts ends at sign-in', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await page.goto('/sign-in');
    await page.evaluate(() => localStorage.setItem('probepath.session-token', 'no-longer-valid'));
    await page.goto('/replays');
    await page.waitForURL('**/sign-in');
    expect(await page.evaluate(() => localStorage.length)).toBe(0);
    await context.close();
  });

  it('loading and unreachable states say what is happening and recover on "Try again"', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('owner').email, DEMO_PASSWORD, 'bench');

    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route('**/api/members', async (route) => {
      await held;
      await route.continue();
    });
    await page.getByTestId('nav-members').click();
    await page.getByTestId('loading-state').first().waitFor();
    await shot(page, size, 'members-loading');
    release();
    await page.getByTestId('members-screen').getByText(demo('tech').email).waitFor();

    await page.unroute('**/api/members');
    await page.route('**/api/mail', (route) => route.abort());
    await page.getByTestId('nav-outbox').click();
    await page.getByTestId('error-state').waitFor();
    expect(await page.getByTestId('error-state').textContent()).toContain('could not reach the server');
    await shot(page, size, 'outbox-unreachable');
    await page.unroute('**/api/mail');
    await page.getByTestId('retry').click();
    await page.getByTestId('error-state').waitFor({ state: 'detached' });
    await page.getByTestId('empty-state').waitFor();

    // A session check that cannot reach the server keeps the session from this device, says so and offers a retry.
    await page.route('**/api/auth/me', (route) => route.abort());
    await page.reload();
    await page.getByTestId('session-offline').waitFor();
    await page.getByTestId('outbox-screen').waitFor();
    await shot(page, size, 'session-unreachable');
    await page.unroute('**/api/auth/me');
    await page.getByTestId('session-retry').click();
    await page.getByTestId('session-offline').waitFor({ state: 'detached' });

    // A first visit with nothing remembered and no server shows the failure in words, with a retry.
    await page.evaluate(() => localStorage.removeItem('probepath.session-user'));
    await page.route('**/api/auth/me', (route) => route.abort());
    await page.reload();
    await page.getByTestId('error-state').waitFor();
    await page.unroute('**/api/auth/me');
    await page.getByTestId('retry').click();
    await page.getByTestId('outbox-screen').waitFor();
    await context.close();
  });

  it('an unknown address shows the not-found page', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await page.goto('/no-such-place');
    await page.getByTestId('not-found').waitFor();
    await shot(page, size, 'not-found');
    await context.close();
  });

  it('the dim-corner theme follows the system setting', async () => {
    const { context, page } = await openPage(browser, server.url, size, 'dark');
    await signIn(page, demo('owner').email, DEMO_PASSWORD, 'bench');
    await shot(page, size, 'dark-bench');
    await page.getByTestId('nav-members').click();
    await page.getByTestId(`manage-${demo('apprentice').email}`).click();
    await shot(page, size, 'dark-members');
    await page.goto('/sign-in');
    await context.close();
  });
});

describe('keyboard use', () => {
  it('Tab moves through the sign-in form and the focused button shows a ring; Enter submits', async () => {
    const { context, page } = await openPage(browser, server.url, 'desk');
    await page.goto('/sign-in');
    await page.getByTestId('sign-in-email').fill(demo('tech').email);
    await page.getByTestId('sign-in-password').fill(DEMO_PASSWORD);
    await page.keyboard.press('Tab');
    await page.keyboard.press('Tab');
    const focused = page.getByTestId('sign-in-submit');
    expect(await focused.evaluate((el) => el === document.activeElement && el.matches(':focus-visible'))).toBe(true);
    expect(await focused.evaluate((el) => getComputedStyle(el).outlineStyle)).toBe('solid');
    await shot(page, 'desk', 'sign-in-keyboard-focus');
    await page.keyboard.press('Enter');
    await page.waitForURL('**/bench');
    await context.close();
  });
});

describe('forgotten password', () => {
  it.each(Object.keys(SIZES) as Size[])('at %s size: ask for a link, follow it from the mail, set a new password, sign in with it', async (size) => {
    const member = demo(size === 'phone' ? 'apprentice' : 'tech');
    const { context, page } = await openPage(browser, server.url, size);
    await page.goto('/sign-in');
    await page.getByTestId('sign-in-forgot').click();
    await page.waitForURL('**/forgot-password');
    await shot(page, size, 'forgot-password');
    await page.getByTestId('forgot-password-email').fill(member.email);
    await page.getByTestId('forgot-password-submit').click();
    await page.getByTestId('forgot-password-sent').waitFor();
    await shot(page, size, 'forgot-password-sent');

    const asOwner = await apiAs(server.url, demo('owner').email, DEMO_PASSWORD);
    const { messages } = await asOwner<{ messages: { id: string; to: string }[] }>('/api/mail');
    const mail = messages.find((m) => m.to === member.email)!;
    const { message } = await asOwner<{ message: { text: string } }>(`/api/mail/${mail.id}`);
    const link = /(http\S+\/reset-password\?token=\S+)/.exec(message.text)![1];

    await page.goto(link);
    await page.getByTestId('reset-password-password').waitFor();
    await page.getByTestId('reset-password-password').fill('short');
    await page.getByTestId('reset-password-submit').click();
    await page.getByText('Use at least 10 characters.').waitFor();
    await shot(page, size, 'reset-password');
    await page.getByTestId('reset-password-password').fill('a brand new pass');
    await page.getByTestId('reset-password-submit').click();
    await page.getByTestId('reset-password-done').waitFor();
    await shot(page, size, 'reset-password-done');

    await page.goto(link);
    await page.getByTestId('reset-password-password').fill('another new pass');
    await page.getByTestId('reset-password-submit').click();
    await page.getByTestId('form-error').waitFor();
    expect(await page.getByTestId('form-error').textContent()).toContain('expired or was already used');
    await page.getByTestId('reset-password-new-link').waitFor();
    await shot(page, size, 'reset-password-used');

    await signIn(page, member.email, 'a brand new pass', member.role === 'apprentice' ? 'replays' : 'bench');
    await context.close();
  });
});
