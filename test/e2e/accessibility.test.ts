import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, demo, launchBrowser, openPage, seriousViolations, signIn, startServer, type RunningServer, type Size } from './support';

/**
 * An automated accessibility audit (axe-core, the open WCAG rule engine) of
 * each main screen at both sizes: no serious or critical violations.
 */
let server: RunningServer;
let browser: Browser;
beforeAll(async () => {
  server = await startServer();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const SCREENS: { role: 'owner' | 'lead' | 'tech' | 'apprentice'; landing: string; paths: string[] }[] = [
  { role: 'owner', landing: 'bench', paths: ['/bench', '/members', '/outbox', '/procedures', '/account'] },
  { role: 'tech', landing: 'bench', paths: ['/bench', '/replays'] },
  { role: 'apprentice', landing: 'replays', paths: ['/replays'] },
];

describe.each(['phone', 'desk'] as Size[])('at %s size', (size) => {
  it('has no serious accessibility violations on the sign-in screen', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await page.goto('/sign-in');
    await page.getByTestId('sign-in-email').waitFor();
    expect(await seriousViolations(page)).toEqual([]);
    await context.close();
  });

  it.each(SCREENS)('has none on the screens of the $role', async ({ role, landing, paths }) => {
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo(role).email, DEMO_PASSWORD, landing);
    for (const p of paths) {
      await page.goto(p);
      await page.waitForLoadState('networkidle');
      expect(await seriousViolations(page), p).toEqual([]);
    }
    await context.close();
  });

  it('has none in the editor of a published procedure, its check list and form included', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('lead').email, DEMO_PASSWORD, 'bench');
    await page.goto('/procedures');
    await page.getByRole('button', { name: /^Open / }).first().click();
    await page.getByTestId('editor-screen').waitFor();
    // Beside the diagram at a desk; on a phone the list is a tab of the side panel.
    const item = page.locator('[data-testid^="check-item-"]').first();
    if (await item.isVisible()) await item.click();
    await page.waitForLoadState('networkidle');
    expect(await seriousViolations(page)).toEqual([]);
    await context.close();
  });
});
