import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DiagnosisDetail } from '@shared/api/diagnosis-types';
import { DEMO_PASSWORD, apiAs, demo, launchBrowser, openPage, type RunningServer, SIZES, type Size, seriousViolations, shot, signIn, startServer } from './support';

/**
 * The technician's whole run at the bench, on the demo shop's "cranks, no spark" procedure (invented demo
 * content): a new job and machine, readings in other prefixes than the spec, a marginal reading and its
 * re-measure, a step taken back, a spell without signal across a reload, and a conclusion at a finding.
 */

let server: RunningServer;
let browser: Browser;

beforeAll(async () => {
  [server, browser] = await Promise.all([startServer(), launchBrowser()]);
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const CUSTOMERS: Record<Size, string> = { phone: 'Wynne Calloway', desk: 'Idris Penrose' };

async function expectAccessible(page: Page, where: string) {
  expect(await seriousViolations(page), where).toEqual([]);
}

async function checkIs(page: Page, title: string) {
  await page.getByTestId('check-title').filter({ hasText: title }).waitFor();
}

async function read(page: Page, reading: string, unit?: string) {
  await page.getByTestId('reading-input').fill(reading);
  if (unit) await page.getByTestId(`unit-${unit}`).click();
}

async function record(page: Page, nextTitle: string) {
  await page.getByTestId('record-reading').click();
  await checkIs(page, nextTitle);
}

/** The path: a panel beside the check on a wide screen, one tap away on a phone. */
async function withPath(page: Page, size: Size, look: () => Promise<void>) {
  if (size === 'phone') await page.getByTestId('toggle-path').click();
  await page.getByTestId('path-list').waitFor();
  await look();
  if (size === 'phone') await page.getByTestId('toggle-path').click();
}

describe.each(Object.keys(SIZES) as Size[])('at %s size', (size) => {
  it('a technician runs a diagnosis from a new job to a finding, through a taken-back step and a spell without signal', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    const tech = demo('tech');
    await signIn(page, tech.email, DEMO_PASSWORD, 'bench');
    await page.getByTestId('bench-open-mine').waitFor();
    await shot(page, size, 'bench-home');
    await expectAccessible(page, 'my bench');

    // Start: a new job for a new machine, with a VIN whose check digit is off.
    await page.getByTestId('bench-start').click();
    await page.getByTestId('start-new-job').waitFor();
    await shot(page, size, 'bench-start-job');
    await page.getByTestId('start-new-job').click();
    await page.getByTestId('job-customer-name').fill(CUSTOMERS[size]);
    await page.getByTestId('job-customer-contact').fill('07700 900345');
    await page.getByTestId('job-customer-email').fill('customer@example.com');
    await page.getByTestId('job-complaint').fill('Cut out on the bypass and now it cranks but never catches.');
    await page.getByTestId('machine-make').fill('Veltro');
    await page.getByTestId('machine-model').fill('Tessa 650');
    await page.getByTestId('machine-year').fill('2015');
    await page.getByTestId('machine-engine').fill('649 cc parallel twin, CDI');
    await page.getByTestId('machine-vin').fill('7VLTS65A5FK104422');
    await page.getByTestId('machine-mileage').fill('41200');
    await page.getByTestId('vin-check').waitFor();
    expect(await page.getByTestId('vin-check').textContent()).toContain('check digit');
    await shot(page, size, 'bench-new-job', page.getByTestId('vin-check'));
    await expectAccessible(page, 'new job');
    await page.getByTestId('new-job-submit').click();

    // A published procedure for the complaint; the one for this machine's family comes first.
    await page.getByTestId('start-procedure-filter').fill('spark');
    const fits = page.locator('[data-testid^="start-procedure-"]').filter({ hasText: 'Fits this machine' });
    await fits.first().waitFor();
    await shot(page, size, 'bench-start-procedure');
    await fits.first().getByRole('button', { name: /Use the procedure/ }).click();

    await page.getByTestId('start-ambient').fill('20');
    await page.getByRole('button', { name: /Bench meter 1/ }).click();
    await shot(page, size, 'bench-start-meter');
    await page.getByTestId('start-meter-next').click();
    await page.getByTestId('procedure-cautions').waitFor();
    expect(await page.getByTestId('manual-first').textContent()).toContain('service manual, local codes and licensed practice come first');
    await shot(page, size, 'bench-start-cautions');
    await expectAccessible(page, 'cautions before the first check');
    await page.getByTestId('start-diagnosis').click();
    await page.waitForURL('**/bench/diagnosis/**');
    const id = page.url().split('/').at(-1)!;

    // One check at a time.
    await checkIs(page, 'Spark at both plug leads');
    await shot(page, size, 'bench-check-observe');
    await expectAccessible(page, 'observe check');
    await page.getByTestId('choice-none').click();
    await checkIs(page, 'Battery voltage at rest');
    // A reading that can't be what this check measures is refused in words, and nothing can be recorded.
    await read(page, '12.6 mA');
    await page.getByTestId('reading-error').waitFor();
    expect(await page.getByTestId('reading-error').textContent()).toMatch(/volt/i);
    expect(await page.getByTestId('record-reading').getAttribute('aria-disabled')).toBe('true');
    await shot(page, size, 'bench-check-unreadable', page.getByTestId('reading-error'));
    await read(page, '12.6');
    expect(await page.getByTestId('verdict-word').textContent()).toBe('In spec');
    await record(page, 'Switched supply at the CDI');
    await read(page, '12,41', 'V');
    await record(page, 'Interlock input pulled to ground');

    // Back takes the last step back: kept on the path, struck through.
    await page.getByTestId('step-back').click();
    await checkIs(page, 'Switched supply at the CDI');
    await withPath(page, size, async () => {
      const taken = page.getByTestId('path-step-3');
      await taken.getByText('Taken back', { exact: true }).waitFor();
      const decoration = await taken.getByTestId('path-step-title').evaluate((el) => getComputedStyle(el).textDecorationLine);
      expect(decoration).toBe('line-through');
      await shot(page, size, 'bench-path-taken-back', taken);
    });
    await read(page, '12.4 V');
    await record(page, 'Interlock input pulled to ground');
    await read(page, '680', 'mV');
    await record(page, 'Pulse coil resistance');

    // A photo on the step just recorded, from the check screen.
    const checkScreen = page.getByTestId('measure-step');
    await checkScreen.getByTestId('add-photo-5-input').setInputFiles(path.resolve(__dirname, '../fixtures/photos/connector.jpg'));
    await checkScreen.getByTestId('photos-5-0').waitFor();
    expect(await checkScreen.getByTestId('add-photo-5').textContent()).toContain('1 so far');

    // A reading in another prefix than the spec, close enough to a limit to be marginal: measure again.
    await shot(page, size, 'bench-check-measure');
    await read(page, '0.437k');
    await page.getByTestId('verdict').waitFor();
    expect(await page.getByTestId('verdict-word').textContent()).toBe('Marginal');
    expect(await page.getByTestId('verdict').textContent()).toContain('437 Ω');
    await shot(page, size, 'bench-check-marginal', page.getByTestId('spec'));
    await expectAccessible(page, 'measure check with a verdict');
    await page.getByTestId('record-reading').click();
    await page.getByTestId('check-details').getByText('CHECK 6').waitFor();

    // No signal: the API is unreachable, the page is reloaded, and the work goes on from the device.
    await page.route('**/api/**', (route) => route.abort());
    await page.reload();
    await page.getByTestId('session-offline').waitFor();
    await checkIs(page, 'Pulse coil resistance');
    await read(page, '0.421', 'kΩ');
    await record(page, 'Pulse coil insulation to ground');
    await page.getByTestId('sync-pending').getByText('No signal').waitFor();
    // Nothing typed is lost on a reload, even before it reached the server.
    await page.reload();
    await checkIs(page, 'Pulse coil insulation to ground');
    await page.getByTestId('unit-OL').click();
    await record(page, 'Pulse coil output while cranking');
    await withPath(page, size, async () => {
      expect(await page.getByText('Pending · on this phone').count()).toBe(2);
      await shot(page, size, 'bench-path-pending', page.getByText('Pending · on this phone').last());
      await expectAccessible(page, 'path with pending and taken-back steps');
    });
    await shot(page, size, 'bench-check-offline');

    // Signal back: the outbox goes out in order, each step once.
    await page.unroute('**/api/**');
    await context.setOffline(true);
    await context.setOffline(false);
    await page.getByTestId('sync-pending').waitFor({ state: 'detached', timeout: 20_000 });
    const get = await apiAs(server.url, tech.email, DEMO_PASSWORD);
    const { diagnosis } = await get<{ diagnosis: DiagnosisDetail }>(`/api/diagnoses/${id}`);
    expect(diagnosis.steps.map((s) => [s.seq, s.checkId, s.readingText ?? s.choiceId, s.verdict, s.retracted])).toEqual([
      [1, 'spark-test', 'none', null, false],
      [2, 'battery-volts', '12.6 V', 'in_spec', false],
      [3, 'cdi-supply', '12,41 V', 'in_spec', true],
      [4, 'cdi-supply', '12.4 V', 'in_spec', false],
      [5, 'interlock-ground', '680 mV', 'in_spec', false],
      [6, 'sensor-resistance', '0.437k', 'marginal', false],
      [7, 'sensor-resistance', '0.421 kΩ', 'in_spec', false],
      [8, 'sensor-to-ground', 'OL', 'in_spec', false],
    ]);
    expect(diagnosis.currentCheckId).toBe('sensor-ac');

    // A paired check shows the earlier reading beside the new one.
    await read(page, '3.6');
    await record(page, 'Pulse signal arriving at the CDI');
    expect(await page.getByTestId('paired-reading').textContent()).toContain('3.6 V');
    await read(page, '0.8');
    expect(await page.getByTestId('verdict-word').textContent()).toBe('Low');
    await shot(page, size, 'bench-check-paired', page.getByTestId('paired-reading'));
    await page.getByTestId('step-note').fill('Jumps to 3.4 V with the bars turned right: the harness shorts on the left lock.');
    await record(page, 'Pulse coil harness fault');

    // Conclude at the finding.
    await page.getByTestId('finding').waitFor();
    await page.getByTestId('conclude-parts').fill('Solder sleeve ×2; split loom 0.4 m');
    await page.getByTestId('conclude-labour').fill('95');
    await page.getByTestId('conclude-note').fill('Chafed pulse-coil wire under the tank repaired and re-routed; spark on both cylinders.');
    await shot(page, size, 'bench-finding');
    await page.getByTestId('conclude').click();
    await page.getByTestId('conclusion').waitFor();
    await shot(page, size, 'bench-concluded');
    await expectAccessible(page, 'concluded diagnosis');
    const after = await get<{ diagnosis: DiagnosisDetail }>(`/api/diagnoses/${id}`);
    expect(after.diagnosis.status).toBe('concluded');
    expect(after.diagnosis.conclusion).toMatchObject({ findingCheckId: 'finding-sensor-harness', labourMinutes: 95 });
    expect(after.diagnosis.steps.filter((s) => !s.retracted)).toHaveLength(9);
    expect(after.diagnosis.photos.map((p) => p.stepId)).toEqual([after.diagnosis.steps.find((s) => s.seq === 5)!.id]);

    await page.getByTestId('open-report').click();
    await page.waitForURL(`**/report/${id}`);
    await page.getByTestId('report-paper').getByText('Pulse coil harness fault').first().waitFor();
    await context.close();
  });

  it('the bench resumes an open diagnosis where it stands, on another device', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('tech').email, DEMO_PASSWORD, 'bench');
    const resume = page.locator('[data-testid^="resume-"]').first();
    await resume.click();
    await page.waitForURL('**/bench/diagnosis/**');
    await page.getByTestId('check-title').waitFor();
    const title = await page.getByTestId('check-title').textContent();
    await page.reload();
    await checkIs(page, title!);
    await context.close();
  });

  it('a technician stops a diagnosis without a finding, after a second press and with the reason', async () => {
    const tech = await apiAs(server.url, demo('tech').email, DEMO_PASSWORD);
    const { procedures } = await tech<{ procedures: { id: string; latestPublished: number | null }[] }>('/api/procedures');
    const { jobs } = await tech<{ jobs: { id: string }[] }>('/api/jobs');
    const { meters } = await tech<{ meters: { id: string }[] }>('/api/meters');
    const procedure = procedures.find((p) => p.latestPublished)!;
    const { diagnosis } = await tech<{ diagnosis: DiagnosisDetail }>('/api/diagnoses', {
      method: 'POST',
      body: { procedureId: procedure.id, jobId: jobs[0].id, meterId: meters[0].id, ambientC: 19 },
    });

    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('tech').email, DEMO_PASSWORD, 'bench');
    await page.goto(`/bench/diagnosis/${diagnosis.id}`);
    await page.getByTestId('check-title').waitFor();
    if (size === 'phone') await page.getByTestId('toggle-path').click();
    await page.getByTestId('stop-diagnosis').click();
    // Nothing stops on the first press, nor without a reason.
    await page.getByTestId('stop-confirm').click();
    await page.getByTestId('stop-diagnosis-form').getByText('Say why the diagnosis stops here.').waitFor();
    expect((await tech<{ diagnosis: DiagnosisDetail }>(`/api/diagnoses/${diagnosis.id}`)).diagnosis.status).toBe('open');
    await page.getByTestId('stop-reason').fill('Customer collected the machine before the pulse coil test.');
    await shot(page, size, 'bench-stop', page.getByTestId('stop-diagnosis-form'));
    await expectAccessible(page, 'stop a diagnosis');
    await page.getByTestId('stop-confirm').click();
    await page.getByTestId('abandoned').getByText('Customer collected the machine before the pulse coil test.').waitFor();
    await shot(page, size, 'bench-stopped');
    await page.getByTestId('abandoned').getByTestId('open-report').click();
    await page.waitForURL(`**/report/${diagnosis.id}`);
    await page.getByTestId('report-paper').getByText('Customer collected the machine before the pulse coil test.').first().waitFor();

    const after = (await tech<{ diagnosis: DiagnosisDetail }>(`/api/diagnoses/${diagnosis.id}`)).diagnosis;
    expect(after.status).toBe('abandoned');
    expect(after.abandonReason).toBe('Customer collected the machine before the pulse coil test.');
    await context.close();
  });

  it('the bench says what it is waiting for, what went wrong and what to do, and has a designed empty state', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('tech').email, DEMO_PASSWORD, 'bench');
    const lists = /\/api\/diagnoses\?status=/;

    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route(lists, async (route) => {
      await held;
      await route.continue();
    });
    await page.reload();
    await page.getByTestId('loading-state').waitFor();
    await shot(page, size, 'bench-loading');
    release();
    await page.getByTestId('bench-open-mine').waitFor();
    await page.unroute(lists);

    await page.route(lists, (route) => route.fulfill({ json: { diagnoses: [] } }));
    await page.reload();
    await page.getByTestId('empty-state').waitFor();
    await shot(page, size, 'bench-empty');
    await expectAccessible(page, 'empty bench');
    await page.unroute(lists);

    await page.route(lists, (route) => route.abort());
    await page.reload();
    await page.getByTestId('error-state').waitFor();
    expect(await page.getByTestId('error-state').textContent()).toContain('could not reach the server');
    await shot(page, size, 'bench-unreachable');
    await page.unroute(lists);
    await page.getByTestId('retry').click();
    await page.getByTestId('bench-open-mine').waitFor();

    await page.goto('/bench/diagnosis/00000000-0000-4000-8000-000000000000');
    await page.getByTestId('diagnosis-missing').waitFor();
    await shot(page, size, 'bench-diagnosis-missing');
    await context.close();
  });
});
