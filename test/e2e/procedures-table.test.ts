import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ProcedureSummary } from '@shared/api/procedure-types';
import { apiAs, DEMO_PASSWORD, demo, launchBrowser, openPage, type PageSize, type RunningServer, shot, signIn, startServer } from './support';

/** The procedures table of the lead's desk: filters kept in the link, the empty result that names its filter, Duplicate; desk, tablets and phone. */

let server: RunningServer;
let browser: Browser;
const lead = demo('lead');

beforeAll(async () => {
  [server, browser] = await Promise.all([startServer(), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

async function openAsLead(size: PageSize) {
  const opened = await openPage(browser, server.url, size);
  await signIn(opened.page, lead.email, DEMO_PASSWORD, 'bench');
  return opened;
}

/** Visible buttons (and fields) smaller than 44 px either way, by their accessible name. */
async function smallTargets(page: Page): Promise<string[]> {
  return page.locator('[role="button"]:visible, input:visible').evaluateAll((nodes) =>
    nodes
      .map((n) => ({ name: n.getAttribute('aria-label') ?? n.getAttribute('data-testid') ?? n.textContent ?? '', box: n.getBoundingClientRect() }))
      .filter(({ box }) => box.width > 0 && (box.width < 43.5 || box.height < 43.5))
      .map(({ name, box }) => `${name} (${Math.round(box.width)}×${Math.round(box.height)})`),
  );
}

const rowCount = (page: Page) => page.locator('[data-testid^="procedures-table-row-"]').count();

describe('the procedures table at a desk', () => {
  it('filters by versions and family, keeps the filters in the link, and names the filter that hides everything', async () => {
    const { context, page } = await openAsLead('desk');
    await page.goto('/procedures');
    await page.getByTestId('procedures-table').waitFor();
    expect(await rowCount(page)).toBe(5);

    await page.getByTestId('filter-state-draft').click();
    await expect.poll(() => rowCount(page)).toBe(1);
    expect(page.url()).toContain('state=draft');
    expect(await page.getByTestId('procedure-count').textContent()).toBe('1 of 5 procedures match');

    // The link keeps the filters: a fresh load of the same address shows the same rows.
    await page.getByRole('button', { name: /^Nordane Fellrunner 450 and 570 ATVs \(2\)$/ }).click();
    await expect.poll(() => page.url()).toContain('family=');
    const link = page.url();
    await page.goto(link);
    await page.getByTestId('procedures-table').waitFor();
    expect(await rowCount(page)).toBe(1);
    expect(await page.getByTestId('filter-state-draft').getAttribute('aria-pressed')).toBe('true');
    await shot(page, 'desk', 'procedures-filtered');

    // No demo procedure's latest version is retired: the empty result says the versions filter is what hides them.
    await page.getByTestId('filter-state-retired').click();
    await page.getByTestId('no-matches').waitFor();
    expect(await page.getByTestId('no-matches').textContent()).toContain('The versions filter “Retired” hides every procedure the rest let through; without it, 2 would show.');
    await shot(page, 'desk', 'procedures-no-matches');
    await page.getByTestId('no-matches-clear-state').click();
    await expect.poll(() => rowCount(page)).toBe(2);
    expect(page.url()).not.toContain('state=');

    await page.getByTestId('procedure-search').fill('headlight');
    await expect.poll(() => rowCount(page)).toBe(1);
    await expect.poll(() => page.url()).toContain('q=headlight');
    await page.getByTestId('filters-clear').click();
    await expect.poll(() => rowCount(page)).toBe(5);
    expect(await page.getByTestId('procedure-search').inputValue()).toBe('');
    await context.close();
  });

  it('duplicates a procedure: the copy opens in the editor titled as a copy, with the same checks', async () => {
    const { context, page } = await openAsLead('desk');
    const asLead = await apiAs(server.url, lead.email, DEMO_PASSWORD);
    const { procedures } = await asLead<{ procedures: ProcedureSummary[] }>('/api/procedures');
    const original = procedures.find((p) => p.title.startsWith('Battery drains'))!;
    await page.goto('/procedures');
    await page.getByTestId(`duplicate-${original.id}`).click();
    await page.getByTestId('check-list').waitFor();
    const copyId = page.url().split('/').pop()!;
    expect(copyId).not.toBe(original.id);
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe(`${original.title} (copy)`);
    const { procedure } = await asLead<{ procedure: { versions: { checkCount: number }[] } }>(`/api/procedures/${original.id}`);
    expect(await page.locator('[data-testid^="check-item-"]').count()).toBe(procedure.versions[0].checkCount);
    await shot(page, 'desk', 'procedure-duplicated');

    await page.getByTestId('editor-back').click();
    await page.getByTestId('procedures-table').waitFor();
    expect(await page.getByTestId(`procedures-table-row-${copyId}`).textContent()).toContain('Never published');
    await context.close();
  });
});

const zoomReadout = async (page: Page) => Number((await page.getByTestId('procedure-diagram-zoom').textContent())!.replace(/\D/g, ''));
const selectedCheck = (page: Page) => page.locator('[data-testid^="check-item-"][aria-current="page"]').getAttribute('data-testid');

describe("the editor's diagram at a desk", () => {
  it('fits a 30-check procedure at a legible size, zooms with the wheel about the pointer, and answers its shortcuts', async () => {
    const { context, page } = await openAsLead('desk');
    const asLead = await apiAs(server.url, lead.email, DEMO_PASSWORD);
    const { procedures } = await asLead<{ procedures: ProcedureSummary[] }>('/api/procedures');
    const large = procedures.find((p) => p.title.startsWith('Cranks, no spark'))!;
    await page.goto('/procedures');
    await page.getByTestId(`duplicate-${large.id}`).click();
    await page.getByTestId('check-list').waitFor();
    expect(await page.locator('[data-testid^="check-item-"]').count()).toBe(30);

    // Fit keeps text legible: the smallest text (13 units) at 92 % is 12 px; measured on the drawn titles too.
    const fitted = await zoomReadout(page);
    expect(fitted).toBeGreaterThanOrEqual(92);
    const heights = await page.locator('[data-testid="procedure-diagram"] svg text').evaluateAll((nodes) => nodes.map((n) => n.getBoundingClientRect().height).filter((h) => h > 0));
    expect(heights.length).toBeGreaterThan(10);
    expect(Math.min(...heights)).toBeGreaterThanOrEqual(12);
    await shot(page, 'desk', 'editor-fit-large');

    // The wheel zooms in about the pointer and changes the readout.
    const box = (await page.getByTestId('procedure-diagram').boundingBox())!;
    await page.mouse.move(box.x + box.width / 2, box.y + 120);
    await page.mouse.wheel(0, -200);
    await expect.poll(() => zoomReadout(page)).toBeGreaterThan(fitted);
    await page.mouse.wheel(0, 400);
    await expect.poll(() => zoomReadout(page)).toBeLessThan(fitted);

    // Keys: + and − step the zoom, 0 fits again; the list of shortcuts is one press away.
    await page.getByTestId('procedure-diagram-keys').click();
    await page.getByTestId('procedure-diagram-shortcuts').waitFor();
    expect(await page.getByTestId('procedure-diagram-shortcuts').textContent()).toContain('Delete the selected check');
    await shot(page, 'desk', 'editor-shortcuts');
    await page.keyboard.press('0');
    await expect.poll(() => zoomReadout(page)).toBe(fitted);
    await page.keyboard.press('+');
    await expect.poll(() => zoomReadout(page)).toBe(Math.min(200, Math.round(fitted * 1.25)));
    await page.keyboard.press('0');

    // Arrows walk the arrows: down to the first outcome's check and back up.
    const start = await selectedCheck(page);
    await page.keyboard.press('ArrowDown');
    await expect.poll(() => selectedCheck(page)).not.toBe(start);
    const below = await selectedCheck(page);
    await page.keyboard.press('ArrowUp');
    await expect.poll(() => selectedCheck(page)).toBe(start);
    await page.keyboard.press('ArrowDown');

    // Delete asks first; "Keep it" keeps it; confirmed, the check goes, and Ctrl+Z brings it back.
    await page.keyboard.press('Delete');
    await page.getByTestId('confirm-delete').waitFor();
    await page.getByTestId('confirm-delete-no').click();
    expect(await page.getByTestId(below!).count()).toBe(1);
    await page.keyboard.press('Delete');
    await page.getByTestId('confirm-delete-yes').click();
    await expect.poll(() => page.getByTestId(below!).count()).toBe(0);
    await page.keyboard.press('Control+z');
    await expect.poll(() => page.getByTestId(below!).count()).toBe(1);
    await context.close();
  });
});

describe('the procedures table and the editor on tablets and a phone', () => {
  for (const size of ['tablet', 'tabletTall'] as const) {
    it(`is usable at ${size} size: cards and an editor whose diagram keeps room, with 44 px targets`, async () => {
      const { context, page } = await openAsLead(size);
      await page.goto('/procedures');
      await page.getByTestId('procedure-cards').waitFor();
      expect(await smallTargets(page)).toEqual([]);
      await shot(page, size, 'procedures');

      await page.getByRole('button', { name: /^Open Headlight dead on low beam$/ }).click();
      await page.getByTestId('procedure-diagram').waitFor();
      await page.getByTestId('check-form').waitFor();
      expect(await smallTargets(page)).toEqual([]);
      const diagram = (await page.getByTestId('procedure-diagram').boundingBox())!;
      expect(diagram.width).toBeGreaterThan(300);
      expect(diagram.height).toBeGreaterThan(300);
      await shot(page, size, 'editor');

      // Away from a desk the check list is a tab of the side panel; picking a check there opens its form.
      await page.getByTestId('panel-checks').click();
      await page.getByTestId('check-list').waitFor();
      await shot(page, size, 'editor-checks');
      await page.locator('[data-testid^="check-item-"]').nth(2).click();
      await page.getByTestId('check-form').waitFor();
      await context.close();
    });
  }

  it('shows cards with Duplicate on a phone', async () => {
    const { context, page } = await openAsLead('phone');
    const { procedures } = await (await apiAs(server.url, lead.email, DEMO_PASSWORD))<{ procedures: ProcedureSummary[] }>('/api/procedures');
    await page.goto('/procedures?state=draft');
    await page.getByTestId('procedure-cards').waitFor();
    expect(await page.locator('[data-testid^="procedure-card-"]').count()).toBe(procedures.filter((p) => p.hasDraft).length);
    expect(await page.locator('[data-testid^="procedure-card-"] [data-testid^="duplicate-"]').count()).toBe(procedures.filter((p) => p.hasDraft).length);
    await shot(page, 'phone', 'procedures-filtered');
    await context.close();
  });
});
