import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DiagnosisDetail } from '@shared/api/diagnosis-types';
import type { VersionDetail } from '@shared/api/procedure-types';
import { fixtureProcedure } from '../support/fixture-procedure';
import { apiAs, DEMO_PASSWORD, demo, launchBrowser, openPage, type RunningServer, seriousViolations, shot, signIn, startServer } from './support';

/**
 * A picture on a check, end to end: the lead uploads one at the desk (1440×900), says what it shows and
 * publishes; a technician sees it on the bench on a phone (390×844). The picture is the invented connector
 * drawn for the tests; the procedure is the API tests' invented one.
 */

let server: RunningServer;
let browser: Browser;
let procedureId = '';
let diagnosisId = '';
const PICTURE = path.resolve(__dirname, '../fixtures/photos/connector.png');
const ALT = 'Pickup connector P-2 from the wire side: pin 1 blue/yellow left, pin 2 green right';
const lead = demo('lead');

beforeAll(async () => {
  [server, browser] = await Promise.all([startServer(), launchBrowser()]);
  const asLead = await apiAs(server.url, lead.email, DEMO_PASSWORD);
  const { procedure } = await asLead<{ procedure: { id: string } }>('/api/procedures', {
    method: 'POST',
    body: { title: 'No spark, pickup pictures', complaint: 'cranks but no spark', family: 'Brightwater 125 scooters' },
  });
  procedureId = procedure.id;
  await asLead(`/api/procedures/${procedureId}/draft`, { method: 'PUT', body: { revision: 1, document: fixtureProcedure() } });
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const saved = (page: Page) => expect.poll(() => page.getByTestId('save-state').textContent(), { timeout: 10_000 }).toContain('All changes saved');
/** The picture's image once its bytes came through with the session (a blob URL on the web). */
const loadedImage = (page: Page, testID: string) =>
  expect.poll(() => page.getByTestId(testID).locator('img').first().getAttribute('src').catch(() => null), { timeout: 10_000 }).toMatch(/^blob:/);

describe('pictures on a check', () => {
  it('the lead adds a picture with what it shows to a check, keeps the form through a failed upload, and publishes', async () => {
    const { context, page } = await openPage(browser, server.url, 'desk');
    await signIn(page, lead.email, DEMO_PASSWORD, 'bench');
    await page.goto(`/procedures/${procedureId}`);
    await page.getByTestId('check-item-coil').click();
    await page.getByTestId('check-form').waitFor();
    await page.getByTestId('form-title').fill('Pickup coil resistance at P-2');

    // A text file named like a picture is refused by the server; the form keeps what was typed.
    await page.getByTestId('form-picture-add-input').setInputFiles({ name: 'pinout.png', mimeType: 'image/png', buffer: Buffer.from('pin 1 blue/yellow, pin 2 green\n') });
    await page.getByTestId('form-picture-error').waitFor();
    expect(await page.getByTestId('form-picture-error').textContent()).toMatch(/JPEG, PNG or WebP/);
    expect(await page.getByTestId('form-title').inputValue()).toBe('Pickup coil resistance at P-2');
    await saved(page);

    await page.getByTestId('form-picture-add-input').setInputFiles(PICTURE);
    await page.getByTestId('form-picture-0').waitFor();
    await loadedImage(page, 'form-picture-0-image');
    expect(await page.getByTestId('form-picture-error').count()).toBe(0);
    await shot(page, 'desk', 'check-picture-uploaded', page.getByTestId('form-pictures'));
    // Not in the check until it says what it shows.
    await page.getByTestId('form-picture-0-alt').fill(ALT);
    await saved(page);
    await page.getByTestId('panel-preview').click();
    await page.getByTestId('preview-pictures-0').waitFor();
    await loadedImage(page, 'preview-pictures-0');
    await shot(page, 'desk', 'check-picture-preview', page.getByTestId('preview-check'));

    // Undo takes the picture out of the check, redo puts it back.
    await page.getByTestId('undo').click();
    await page.getByTestId('panel-check').click();
    await page.getByTestId('check-item-coil').click();
    await expect.poll(() => page.getByTestId('form-picture-0').count()).toBe(0);
    await page.getByTestId('redo').click();
    await page.getByTestId('form-picture-0').waitFor();
    expect(await page.getByTestId('form-picture-0-alt').inputValue()).toBe(ALT);
    await saved(page);
    await shot(page, 'desk', 'check-picture-described', page.getByTestId('form-pictures'));

    await page.getByTestId('publish-note').fill('The pickup check shows its connector.');
    await page.getByTestId('publish').click();
    await page.waitForURL('**/procedures');
    const asLead = await apiAs(server.url, lead.email, DEMO_PASSWORD);
    const { version } = await asLead<{ version: VersionDetail }>(`/api/procedures/${procedureId}/versions/1`);
    expect(version.document.checks[0].pictures).toEqual([{ src: expect.stringMatching(/^[0-9a-f-]{36}$/), alt: ALT }]);
    await context.close();
  });

  it('a technician sees the picture on the bench on a phone and opens it large', async () => {
    const tech = await apiAs(server.url, demo('tech').email, DEMO_PASSWORD);
    const { jobs } = await tech<{ jobs: { id: string }[] }>('/api/jobs');
    const { meters } = await tech<{ meters: { id: string }[] }>('/api/meters');
    const { diagnosis } = await tech<{ diagnosis: DiagnosisDetail }>('/api/diagnoses', { method: 'POST', body: { procedureId, jobId: jobs[0].id, meterId: meters[0].id, ambientC: 20 } });

    const { context, page } = await openPage(browser, server.url, 'phone');
    await signIn(page, demo('tech').email, DEMO_PASSWORD, 'bench');
    await page.goto(`/bench/diagnosis/${diagnosis.id}`);
    await expect.poll(() => page.getByTestId('check-title').textContent()).toBe('Pickup coil resistance at P-2');
    const thumb = page.getByTestId('check-pictures-0');
    await loadedImage(page, 'check-pictures-0');
    expect(await thumb.getAttribute('aria-label')).toBe(`${ALT}: show large`);
    expect(await page.getByTestId('check-pictures').textContent()).toContain(ALT);
    await shot(page, 'phone', 'bench-check-picture', page.getByTestId('check-pictures'));
    expect(await seriousViolations(page), 'bench check with a picture').toEqual([]);
    await thumb.click();
    await page.getByTestId('check-pictures-close').waitFor();
    await shot(page, 'phone', 'bench-check-picture-large');
    await page.getByTestId('check-pictures-close').click();
    await context.close();
    diagnosisId = diagnosis.id;
  });

  it('an apprentice replaying the concluded diagnosis sees the picture on its step', async () => {
    const tech = await apiAs(server.url, demo('tech').email, DEMO_PASSWORD);
    await tech(`/api/diagnoses/${diagnosisId}/steps`, { method: 'POST', body: { checkId: 'coil', reading: '462 Ω' } });
    await tech(`/api/diagnoses/${diagnosisId}/steps`, { method: 'POST', body: { checkId: 'spark', choiceId: 'flash' } });
    await tech(`/api/diagnoses/${diagnosisId}/conclude`, { method: 'POST', body: { note: 'Spark restored after re-seating P-2.' } });

    const { context, page } = await openPage(browser, server.url, 'phone');
    await signIn(page, demo('apprentice').email, DEMO_PASSWORD, 'replays');
    await page.goto(`/replays/${diagnosisId}`);
    await page.getByTestId('replay-step-1').waitFor();
    await loadedImage(page, 'replay-check-pictures-0');
    expect(await page.getByTestId('replay-check-pictures').textContent()).toContain(ALT);
    await shot(page, 'phone', 'replay-check-picture', page.getByTestId('replay-check-pictures'));
    await context.close();
  });
});
