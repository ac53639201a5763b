import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role, SECTIONS, sectionsFor } from '@shared/auth/roles';
import { DEMO_PASSWORD, demo, launchBrowser, navSections, openPage, type RunningServer, SIZES, type Size, shot, signIn, startServer } from './support';

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
  it.each(ROLES)('%s lands on their first section and sees only their sections', async (role: Role) => {
    const { context, page } = await openPage(browser, server.url, size);
    const allowed = sectionsFor(role);
    await signIn(page, demo(role).email, DEMO_PASSWORD, allowed[0]);

    expect(await navSections(page)).toEqual(allowed);
    await expect.poll(() => page.getByTestId('shell-shop-name').first().textContent()).toBe('Harrow Lane Motor Works');

    for (const section of allowed) {
      await page.getByTestId(`nav-${section}`).click();
      await page.waitForURL(`**/${section}`);
      await page.getByTestId(`${section}-screen`).waitFor();
      await shot(page, size, `${section}-${role}`);
    }

    await page.getByTestId('nav-account').click();
    await page.getByTestId('account-card').waitFor();
    expect(await page.getByTestId('account-card').textContent()).toContain(demo(role).name);
    await shot(page, size, `account-${role}`);
    await context.close();
  });

  it.each(ROLES.filter((r) => sectionsFor(r).length < SECTIONS.length))(
    '%s typing the address of a forbidden section gets "not available", not the screen',
    async (role: Role) => {
      const { context, page } = await openPage(browser, server.url, size);
      await signIn(page, demo(role).email, DEMO_PASSWORD, sectionsFor(role)[0]);
      for (const section of SECTIONS.filter((s) => !sectionsFor(role).includes(s))) {
        await page.goto(`/${section}`);
        await page.getByTestId('section-unavailable').waitFor();
        expect(await page.getByTestId('section-unavailable').textContent()).toContain('not available for your role');
        expect(await page.getByTestId(`${section}-screen`).count()).toBe(0);
      }
      await shot(page, size, `not-available-${role}`);
      await page.getByTestId('section-unavailable-home').click();
      await page.waitForURL(`**/${sectionsFor(role)[0]}`);
      await context.close();
    },
  );
});
