import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ProcedureSummary } from '@shared/api/procedure-types';
import type { ProcedureFile } from '@shared/procedures/exchange-format';
import { apiAs, DEMO_PASSWORD, demo, launchBrowser, openPage, type RunningServer, shot, signIn, startServer } from './support';

/**
 * The lead's desk at 1440×900: a procedure built from nothing, validated, previewed, published, seen by a
 * technician, versioned and compared, exported and imported, and two leads editing one draft.
 * Readings are invented demo values for an invented scooter; the window is common practice for a pickup coil.
 */

let server: RunningServer;
let browser: Browser;
const TITLE = 'No spark, Brightwater 125 CDI';
const lead = demo('lead');

beforeAll(async () => {
  [server, browser] = await Promise.all([startServer(), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

async function openLeadDesk() {
  const { context, page } = await openPage(browser, server.url, 'desk');
  await signIn(page, lead.email, DEMO_PASSWORD, 'bench');
  return { context, page };
}

const problemsBadge = (page: Page) => page.getByTestId('problems-panel');
const saved = (page: Page) => expect.poll(() => page.getByTestId('save-state').textContent(), { timeout: 10_000 }).toContain('All changes saved');

/** Points an outcome of the selected check at an existing check, or adds a new check of `kind` there. */
async function outcome(page: Page, label: string, to: { id: string } | { kind: 'measure' | 'observe' | 'task' | 'finding' }) {
  const slug = label.replace(/\W+/g, '-');
  await page.getByTestId(`outcome-${slug}`).click();
  await page.getByTestId('id' in to ? `outcome-${slug}-to-${to.id}` : `outcome-${slug}-new-${to.kind}`).click();
}

async function select(page: Page, id: string) {
  await page.getByTestId(`check-item-${id}`).click();
  await page.getByTestId('check-form').waitFor();
}

async function fill(page: Page, testID: string, value: string) {
  await page.getByTestId(testID).fill(value);
}

describe('the lead at a desk', () => {
  let procedureId = '';

  it('builds a procedure of six checks from scratch, fixes what validation shows, previews and publishes it', async () => {
    const { context, page } = await openLeadDesk();
    await page.getByTestId('nav-procedures').click();
    await page.getByTestId('new-procedure').click();
    await fill(page, 'create-title', TITLE);
    await fill(page, 'create-complaint', 'cranks but no spark');
    await fill(page, 'create-family', 'Brightwater 125 and 150 scooters, 2019–2024');
    await page.getByTestId('create-submit').click();
    await page.getByTestId('editor-screen').waitFor();
    await page.getByTestId('check-list').waitFor();
    procedureId = page.url().split('/').pop()!;

    // The start: a measurement, added on its own and made the start.
    await page.getByTestId('add-measure').click();
    await page.getByTestId('make-start').click();
    await fill(page, 'form-title', 'Pickup coil resistance');
    await fill(page, 'form-instruction', 'Unplug the pickup connector and measure across the coil.');
    await fill(page, 'form-connector', 'C-12 pickup, 2-pin');
    await fill(page, 'form-pins', '1, 2');

    // A window of 0..0 and three verdicts with nowhere to go: the panel says so.
    await expect.poll(() => problemsBadge(page).textContent()).toMatch(/\d+ to fix/);
    const listed = await problemsBadge(page).textContent();
    expect(listed).toMatch(/outcome/i);
    await shot(page, 'desk', 'editor-problems');

    await fill(page, 'form-min', '400 Ω');
    await fill(page, 'form-max', '0.6 kΩ');
    await outcome(page, 'in spec', { kind: 'observe' });
    await select(page, 'measure-2');
    await outcome(page, 'low', { kind: 'finding' });
    await select(page, 'measure-2');
    await outcome(page, 'high', { id: 'finding-4' });
    await outcome(page, 'open', { id: 'finding-4' });

    await select(page, 'finding-4');
    await fill(page, 'form-title', 'Pickup coil out of spec');
    await fill(page, 'form-part', 'Pickup coil');
    await fill(page, 'form-action', 'Replace the pickup coil, then check for spark again.');

    // The observation: its choices renamed, one added and removed again.
    await select(page, 'observe-3');
    await fill(page, 'form-title', 'Spark at the tester');
    await fill(page, 'form-choice-0', 'Tester flashes');
    await fill(page, 'form-choice-1', 'No flash');
    await page.getByTestId('form-choice-add').click();
    await fill(page, 'form-choice-2', 'Tester flashes');
    await page.getByTestId('form-choices-error').waitFor();
    expect(await page.getByTestId('form-choices-error').textContent()).toContain('say the same');
    await fill(page, 'form-choice-2', 'Weak orange flash');
    await expect.poll(() => page.getByTestId('outcomes').textContent()).toContain('Weak orange flash');
    await page.getByTestId('form-choice-2-remove').click();
    await expect.poll(() => page.getByTestId('outcomes').textContent()).not.toContain('Weak orange flash');
    await outcome(page, 'No flash', { kind: 'task' });
    await select(page, 'task-5');
    await fill(page, 'form-title', 'Unplug the side-stand switch');
    await fill(page, 'form-instruction', 'Disconnect the side-stand switch and crank again with the tester on.');
    await outcome(page, 'done', { kind: 'finding' });
    await select(page, 'finding-6');
    await fill(page, 'form-title', 'Side-stand switch stuck closed');
    await fill(page, 'form-part', 'Side-stand switch');
    await fill(page, 'form-action', 'Replace the side-stand switch.');

    await select(page, 'finding-1');
    await fill(page, 'form-title', 'Ignition works: look at fuel');
    await fill(page, 'form-part', 'None in the ignition');
    await fill(page, 'form-action', 'Go on with the fuel system checks.');

    await expect.poll(() => problemsBadge(page).textContent()).toContain('Ready to publish');
    await saved(page);
    expect(await page.locator('[data-testid^="check-item-"]').count()).toBe(6);
    await page.getByTestId('procedure-diagram-zoom-fit').click();
    await shot(page, 'desk', 'editor');

    // Dragging the diagram's background pans it; Fit brings the fitted view back. (The fit starts at the top,
    // where the start check is, so the drag starts from the bottom left, clear of the checks.)
    const drawing = page.locator('[data-testid="procedure-diagram"] svg > g').first();
    const fitted = await drawing.getAttribute('transform');
    const box = (await page.getByTestId('procedure-diagram').boundingBox())!;
    await page.mouse.move(box.x + 20, box.y + box.height - 20);
    await page.mouse.down();
    await page.mouse.move(box.x + 100, box.y + box.height - 80, { steps: 8 });
    await page.mouse.up();
    expect(await drawing.getAttribute('transform')).not.toBe(fitted);
    await page.getByTestId('procedure-diagram-zoom-fit').click();
    expect(await drawing.getAttribute('transform')).toBe(fitted);

    // Preview: the coil in spec, no flash, the task, the finding.
    const asLead = await apiAs(server.url, lead.email, DEMO_PASSWORD);
    const before = await asLead<{ diagnoses: unknown[] }>('/api/diagnoses');
    await page.getByTestId('panel-preview').click();
    await expect.poll(() => page.getByTestId('preview-check-title').textContent()).toBe('Pickup coil resistance');
    await fill(page, 'preview-reading', '0.35 kΩ');
    await expect.poll(() => page.getByTestId('preview-verdict-word').textContent()).toBe('Low');
    await fill(page, 'preview-reading', '480 Ω');
    await expect.poll(() => page.getByTestId('preview-verdict-word').textContent()).toBe('In spec');
    await shot(page, 'desk', 'preview');
    await page.getByTestId('preview-record').click();
    await expect.poll(() => page.getByTestId('preview-check-title').textContent()).toBe('Spark at the tester');
    await page.getByTestId('preview-choice-not-seen').click();
    await page.getByTestId('preview-done').click();
    await page.getByTestId('preview-finding').waitFor();
    expect(await page.getByTestId('preview-check-title').textContent()).toBe('Side-stand switch stuck closed');
    expect(await page.getByTestId('preview-path').textContent()).toContain('480 Ω');
    await shot(page, 'desk', 'preview-finding');
    await page.getByTestId('preview-restart').click();
    await expect.poll(() => page.getByTestId('preview-check-title').textContent()).toBe('Pickup coil resistance');

    // Nothing was recorded by the preview.
    const after = await asLead<{ diagnoses: unknown[] }>('/api/diagnoses');
    expect(after.diagnoses).toHaveLength(before.diagnoses.length);

    await fill(page, 'publish-note', 'First version: coil, spark and side-stand switch.');
    await page.getByTestId('publish').click();
    await page.waitForURL('**/procedures');
    await page.getByTestId('procedures-table').waitFor();
    await context.close();
  });

  it('shows the published procedure to a technician on a phone', async () => {
    const { context, page } = await openPage(browser, server.url, 'phone');
    await signIn(page, demo('tech').email, DEMO_PASSWORD, 'bench');
    const asTech = await apiAs(server.url, demo('tech').email, DEMO_PASSWORD);
    const { procedures } = await asTech<{ procedures: ProcedureSummary[] }>('/api/procedures');
    expect(procedures.find((p) => p.title === TITLE)).toMatchObject({ latestPublished: 1, latestVersion: { number: 1, status: 'published' } });
    await context.close();
  });

  it('makes version 2 and compares it with version 1, side by side and on the diagrams', async () => {
    const { context, page } = await openLeadDesk();
    await page.goto(`/procedures/${procedureId}`);
    await page.getByTestId('no-draft-screen').waitFor();
    await page.getByTestId('new-draft').click();
    await page.getByTestId('check-list').waitFor();

    await select(page, 'measure-2');
    await fill(page, 'form-min', '450 Ω');
    await outcome(page, 'open', { kind: 'finding' });
    await select(page, 'finding-7');
    await fill(page, 'form-title', 'Pickup coil open circuit');
    await fill(page, 'form-part', 'Pickup coil winding or its lead');
    await fill(page, 'form-action', 'Look for a broken lead at the connector; replace the coil if the winding is open.');
    await expect.poll(() => problemsBadge(page).textContent()).toContain('Ready to publish');
    await saved(page);

    // The draft against version 1 before publishing it.
    await page.getByTestId('panel-versions').click();
    await page.getByTestId('version-1').waitFor();
    expect(await page.getByTestId('version-1-note').textContent()).toBe('First version: coil, spark and side-stand switch.');
    await page.getByTestId('compare-open').click();
    await page.getByTestId('version-compare').waitFor();
    expect(await page.getByTestId('compare-added').textContent()).toContain('Pickup coil open circuit');
    await page.getByTestId('compare-close').click();

    await fill(page, 'publish-note', 'Coil window from 450 Ω; an open coil has its own finding.');
    await page.getByTestId('publish').click();
    await page.waitForURL('**/procedures');

    await page.goto(`/procedures/${procedureId}`);
    await page.getByTestId('versions-panel').waitFor();
    await page.getByTestId('version-2').waitFor();
    expect(await page.getByTestId('version-2').textContent()).toContain(lead.name);
    await page.getByTestId('compare-from-1').click();
    await page.getByTestId('compare-to-2').click();
    await page.getByTestId('compare-open').click();
    await page.getByTestId('version-compare').waitFor();
    await page.getByTestId('compare-after').waitFor();
    expect(await page.getByTestId('compare-added').textContent()).toContain('Pickup coil open circuit');
    const changed = await page.getByTestId('compare-changed-measure-2').textContent();
    expect(changed).toContain('spec.min');
    expect(changed).toContain('400');
    expect(changed).toContain('450');
    expect(await page.getByTestId('compare-repointed').textContent()).toMatch(/open: Pickup coil out of spec → Pickup coil open circuit/);
    await shot(page, 'desk', 'versions-compare');
    await page.getByTestId('compare-close').click();

    // Retiring version 1 asks first.
    await page.getByTestId('version-1-retire').click();
    await page.getByTestId('version-1-confirm').waitFor();
    await shot(page, 'desk', 'versions');
    await page.getByTestId('version-1-retire-confirm').click();
    await expect.poll(() => page.getByTestId('version-1').textContent()).toContain('retired');
    await context.close();
  });

  it('exports the procedure and imports the file back as a new procedure with the same document', async () => {
    const { context, page } = await openLeadDesk();
    await page.getByTestId('nav-procedures').click();
    await page.getByTestId('procedures-table').waitFor();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId(`export-${procedureId}`).click()]);
    expect(download.suggestedFilename()).toBe('no-spark-brightwater-125-cdi-v2.probepath.json');
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'probepath-export-')), download.suggestedFilename());
    await download.saveAs(file);
    const exported = JSON.parse(fs.readFileSync(file, 'utf8')) as ProcedureFile;
    expect(exported).toMatchObject({ format: 'probepath.procedure', formatVersion: 1, title: TITLE, exportedFrom: '2' });
    expect(exported.document.checks).toHaveLength(7);

    await page.getByTestId('import-file').setInputFiles(file);
    await page.getByTestId('check-list').waitFor();
    const importedId = page.url().split('/').pop()!;
    expect(importedId).not.toBe(procedureId);
    const asLead = await apiAs(server.url, lead.email, DEMO_PASSWORD);
    const { draft } = await asLead<{ draft: { document: unknown } }>(`/api/procedures/${importedId}/draft`);
    expect(draft.document).toEqual(exported.document);

    // A file that is not a procedure file is refused whole, with what is wrong.
    const bad = path.join(path.dirname(file), 'not-ours.json');
    fs.writeFileSync(bad, JSON.stringify({ ...exported, formatVersion: 9 }));
    await page.getByTestId('nav-procedures').click();
    await page.getByTestId('procedures-table').waitFor();
    await page.getByTestId('import-file').setInputFiles(bad);
    await page.getByTestId('import-error').waitFor();
    expect(await page.getByTestId('import-error').textContent()).toMatch(/Nothing was imported.*format version 9/);
    await context.close();
  });

  it('gives the second of two leads saving one draft a conflict, and "Reload theirs" shows the first one\'s change', async () => {
    const asLead = await apiAs(server.url, lead.email, DEMO_PASSWORD);
    const { procedures } = await asLead<{ procedures: ProcedureSummary[] }>('/api/procedures');
    const copy = procedures.find((p) => p.title === TITLE && p.id !== procedureId)!;

    const first = await openLeadDesk();
    const second = await openLeadDesk();
    for (const { page } of [first, second]) {
      await page.goto(`/procedures/${copy.id}`);
      await page.getByTestId('check-list').waitFor();
      await select(page, 'task-5');
    }
    await fill(first.page, 'form-title', 'Unplug the side-stand switch connector');
    await saved(first.page);

    await fill(second.page, 'form-title', 'Bridge the side-stand switch');
    await second.page.getByTestId('conflict').waitFor({ timeout: 10_000 });
    expect(await second.page.getByTestId('conflict').textContent()).toContain('were not saved');
    await shot(second.page, 'desk', 'conflict');

    await second.page.getByTestId('conflict-reload').click();
    await expect.poll(() => second.page.getByTestId('check-item-task-5').textContent()).toContain('Unplug the side-stand switch connector');
    await saved(second.page);
    const { draft } = await asLead<{ draft: { document: { checks: { id: string; title: string }[] } } }>(`/api/procedures/${copy.id}/draft`);
    expect(draft.document.checks.find((c) => c.id === 'task-5')?.title).toBe('Unplug the side-stand switch connector');
    await first.context.close();
    await second.context.close();
  });
});
