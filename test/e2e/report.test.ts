import fs from 'node:fs';
import path from 'node:path';
import { PDFParse } from 'pdf-parse';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DiagnosisDetail, DiagnosisSummary } from '@shared/api/diagnosis-types';
import type { MailMessage, MailSummary } from '@shared/api/types';
import { JPEG, PNG } from '../support/photos';
import { DEMO_PASSWORD, demo, launchBrowser, openPage, type RunningServer, type Size, shot, signIn, startServer } from './support';

let server: RunningServer;
let browser: Browser;
let diagnosis: DiagnosisDetail;
const SUBJECT = 'Diagnosis report: your 2016 Veltro Tessa 650';
const SHOTS = path.resolve(__dirname, '../../screenshots');

async function tokenOf(email: string): Promise<string> {
  const res = await fetch(`${server.url}/api/auth/sign-in`, { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password: DEMO_PASSWORD }) });
  return ((await res.json()) as { token: string }).token;
}

async function get<T>(token: string, pathname: string): Promise<T> {
  const res = await fetch(`${server.url}${pathname}`, { headers: { Authorization: `Bearer ${token}` } });
  return (await res.json()) as T;
}

async function uploadPhoto(token: string, bytes: Buffer, type: string, stepId?: string) {
  const form = new FormData();
  if (stepId) form.append('stepId', stepId);
  form.append('photo', new Blob([new Uint8Array(bytes)], { type }), 'photo');
  const res = await fetch(`${server.url}/api/diagnoses/${diagnosis.id}/photos`, { method: 'POST', headers: { Authorization: `Bearer ${token}` }, body: form });
  expect(res.status).toBe(201);
}

/** The PDF's pages as pictures in screenshots/<size>/, to look at; returns its text. */
async function readPdf(pdf: Buffer, size: Size, name: string): Promise<string> {
  const parser = new PDFParse({ data: new Uint8Array(pdf) });
  try {
    const { pages } = await parser.getScreenshot({ scale: 1.2 });
    fs.mkdirSync(path.join(SHOTS, size), { recursive: true });
    pages.forEach((p, i) => fs.writeFileSync(path.join(SHOTS, size, `${name}-page-${i + 1}.png`), p.data));
    return (await parser.getText()).text.replace(/\s+/g, ' ');
  } finally {
    await parser.destroy();
  }
}

/** The demo's no-spark diagnosis on the Tessa, with a photo of the failing check and one of the machine. */
beforeAll(async () => {
  [server, browser] = await Promise.all([startServer(), launchBrowser()]);
  const tech = await tokenOf(demo('tech').email);
  const { diagnoses } = await get<{ diagnoses: DiagnosisSummary[] }>(tech, '/api/diagnoses?status=concluded');
  // The hand-written Tessa story, by its customer: generated diagnoses run on Tessas too.
  const id = diagnoses.find((d) => d.customerName === 'Gethin Marlowe')!.id;
  diagnosis = (await get<{ diagnosis: DiagnosisDetail }>(tech, `/api/diagnoses/${id}`)).diagnosis;
  const last = diagnosis.steps.filter((s) => !s.retracted).at(-1)!;
  await uploadPhoto(tech, JPEG, 'image/jpeg', last.id);
  await uploadPhoto(tech, PNG, 'image/png');
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

async function openReport(page: Page) {
  await page.goto(`/report/${diagnosis.id}`);
  await page.getByTestId('report-paper').waitFor();
  // Both photos arrive as blobs fetched with the session's token.
  await expect.poll(() => page.locator('[data-testid="report-paper"] img[src^="blob:"]').count(), { timeout: 15_000 }).toBeGreaterThanOrEqual(2);
}

describe.each(['phone', 'desk'] as const)('at %s size', (size) => {
  it('shows the technician the report at a glance, saves the PDF, prints clean and e-mails it to the customer', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('tech').email, DEMO_PASSWORD, 'bench');
    await openReport(page);
    const paper = page.getByTestId('report-paper');
    const text = await paper.innerText();
    for (const expected of ['Harrow Lane Motor Works', '2016 Veltro Tessa 650', 'Gethin Marlowe', 'Died at the lights', 'Pulse coil harness fault', '12,41 V', '0.428k', '421 ohm', 'Marginal', 'In spec', 'Low', 'service manual']) {
      expect(text, expected).toContain(expected);
    }
    expect(text).toContain('1 h 35 min');
    expect(await page.getByTestId('report-check-5-result').innerText()).toBe('0.428k');

    // A photo of the finished repair through the upload control; a text file named .jpg is refused in words.
    const input = page.getByTestId('report-photo-add-input');
    await input.setInputFiles({ name: 'notes.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('Cleaned P-2, new split loom.') });
    await page.getByTestId('report-photo-error').waitFor();
    expect(await page.getByTestId('report-photo-error').innerText()).toContain('JPEG, PNG or WebP');
    const before = await page.locator('[data-testid="report-photos"] img[src^="blob:"]').count();
    await input.setInputFiles({ name: `repair-${size}.jpg`, mimeType: 'image/jpeg', buffer: JPEG });
    await expect.poll(() => page.locator('[data-testid="report-photos"] img[src^="blob:"]').count(), { timeout: 15_000 }).toBe(before + 1);
    expect(await page.getByTestId('report-photo-error').count()).toBe(0);
    await shot(page, size, 'report-top');
    await shot(page, size, 'report-checks', page.getByTestId('report-check-5'));
    await shot(page, size, 'report-end', page.getByTestId('report-safety'));

    const [download] = await Promise.all([page.waitForEvent('download'), page.getByTestId('report-download').click()]);
    expect(download.suggestedFilename()).toMatch(/^report-2016-veltro-tessa-650-\d{4}-\d{2}-\d{2}\.pdf$/);
    const pdfText = await readPdf(fs.readFileSync((await download.path())!), size, 'report-pdf');
    for (const reading of diagnosis.steps.filter((s) => !s.retracted && s.readingText).map((s) => s.readingText!)) expect(pdfText, reading).toContain(reading);
    expect(pdfText).toContain('Pulse coil harness fault');

    await page.emulateMedia({ media: 'print' });
    await readPdf(await page.pdf({ format: 'A4', printBackground: true }), size, 'report-printed');
    await page.emulateMedia({ media: 'screen' });

    await page.getByTestId('report-email').click();
    expect(await page.getByTestId('report-email-to').inputValue()).toBe('gethin.marlowe@example.com');
    await page.getByTestId('report-email-send').click();
    await page.getByTestId('report-email-sent').waitFor();
    expect(await page.getByTestId('report-email-sent').innerText()).toContain('gethin.marlowe@example.com');
    await shot(page, size, 'report-emailed', page.getByTestId('report-email-panel'));
    await context.close();
  });

  it('lets the owner find the mailed report with its PDF in the outbox', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('owner').email, DEMO_PASSWORD, 'bench');
    await page.getByTestId('nav-outbox').click();
    await page.getByTestId('mail-list').waitFor();
    await page.getByRole('button', { name: new RegExp(`^${SUBJECT}, to gethin`) }).first().click();
    await page.getByTestId('mail-message').waitFor();
    expect(await page.getByTestId('mail-message').innerText()).toContain('Pulse coil harness fault');
    expect(await page.getByTestId('mail-attachment').innerText()).toMatch(/^Attached: report-2016-veltro-tessa-650-.*\.pdf \(\d+ KB\)$/);
    await shot(page, size, 'report-outbox', page.getByTestId('mail-message'));

    const owner = await tokenOf(demo('owner').email);
    const { messages } = await get<{ messages: MailSummary[] }>(owner, '/api/mail');
    const { message } = await get<{ message: MailMessage }>(owner, `/api/mail/${messages.find((m) => m.subject === SUBJECT)!.id}`);
    expect(message.attachments[0]).toMatchObject({ contentType: 'application/pdf' });
    await context.close();
  });

  it('opens for an apprentice, who may read it but not send it', async () => {
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('apprentice').email, DEMO_PASSWORD, 'replays');
    await openReport(page);
    expect(await page.getByTestId('report-email').count()).toBe(0);
    expect(await page.getByTestId('report-download').count()).toBe(1);
    await shot(page, size, 'report-apprentice');
    await page.getByTestId('report-photo-0').click();
    await page.getByTestId('report-photo-close').waitFor();
    await shot(page, size, 'report-photo-large');
    await page.getByTestId('report-photo-close').click();
    await page.getByTestId('report-photo-close').waitFor({ state: 'detached' });
    await context.close();
  });
});
