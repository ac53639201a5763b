import fs from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DiagnosisDetail, DiagnosisSummary } from '@shared/api/diagnosis-types';
import { practiceQuestions } from '@shared/practice/questions';
import { apiAs, DEMO_PASSWORD, demo, launchBrowser, openPage, type RunningServer, shot, signIn, SIZES, type Size, startServer } from './support';

let server: RunningServer;
let browser: Browser;
let diagnoses: DiagnosisSummary[];
const detail = async (machine: string) => {
  const api = await apiAs(server.url, demo('lead').email, DEMO_PASSWORD);
  const id = diagnoses.find((d) => d.machine.includes(machine))!.id;
  return (await api<{ diagnosis: DiagnosisDetail }>(`/api/diagnoses/${id}`)).diagnosis;
};

beforeAll(async () => {
  [server, browser] = await Promise.all([startServer(), launchBrowser()]);
  const api = await apiAs(server.url, demo('apprentice').email, DEMO_PASSWORD);
  diagnoses = (await api<{ diagnoses: DiagnosisSummary[] }>('/api/diagnoses')).diagnoses;
});

afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

const text = async (page: Page, testID: string) => (await page.getByTestId(testID).first().textContent()) ?? '';

const AXE = fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

/** Serious and critical WCAG violations axe-core finds on the page, one line each. */
async function violations(page: Page): Promise<string[]> {
  await page.addScriptTag({ content: AXE });
  const found = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<{ violations: { id: string; impact: string | null; nodes: { target: string[] }[] }[] }> } }).axe;
    const result = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'] } });
    return result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${v.id} at ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(', ')}`);
  });
  return found;
}

describe('an apprentice on a phone', () => {
  it('filters the replays, then practises a whole replay and is scored by the server', async () => {
    const { context, page } = await openPage(browser, server.url, 'phone');
    await signIn(page, demo('apprentice').email, DEMO_PASSWORD, 'replays');
    await page.getByTestId('replays-cards').waitFor();
    expect(await text(page, 'replays-count')).toBe('3 concluded diagnoses');
    await shot(page, 'phone', 'replays-list-apprentice');

    await page.getByTestId('filter-machine').click();
    await shot(page, 'phone', 'replays-filter-open', page.getByTestId('replay-filters'));
    await page.getByTestId('filter-machine-Veltro Tessa 650').click();
    expect(await text(page, 'replays-count')).toBe('1 of 3 match the filters');
    await page.getByTestId('filter-dates').click();
    await page.getByTestId('filter-from').fill('2020-02-30');
    expect(await page.getByTestId('filter-dates-apply').getAttribute('aria-disabled')).toBe('true');
    await page.getByTestId('filter-from').fill('2020-01-01');
    await page.getByTestId('filter-to').fill('2020-12-31');
    await page.getByTestId('filter-dates-apply').click();
    await page.getByTestId('replays-no-match').waitFor();
    await shot(page, 'phone', 'replays-no-match');
    await page.getByTestId('replays-clear').click();
    expect(await text(page, 'replays-count')).toBe('3 concluded diagnoses');

    const tessa = await detail('Tessa');
    await page.getByTestId(`replay-practise-${tessa.id}`).click();
    await page.getByTestId('replay-step-1').waitFor();
    await shot(page, 'phone', 'practice-first-question');

    // Answer every question: right, except the verdict on the first marginal reading.
    let expectedRight = 0;
    let asked = 0;
    for (const [i, step] of tessa.steps.entries()) {
      await page.getByTestId(`replay-step-${step.seq}`).waitFor();
      const question = practiceQuestions(tessa.document, step)[0];
      if (question) {
        asked += 1;
        expect(await page.getByTestId('replay-verdict').count()).toBe(0);
        expect(await page.getByTestId('replay-next').getAttribute('aria-disabled')).toBe('true');
        const wrong = question.asked === 'verdict' && step.verdict === 'marginal' && expectedRight === asked - 1;
        const choice = wrong ? question.choices.find((c) => c.value !== question.expected)!.value : question.expected;
        if (!wrong) expectedRight += 1;
        await page.getByTestId(`practice-choice-${choice}`).click();
        await page.getByTestId('practice-result').waitFor();
        expect(await text(page, 'practice-result-word')).toBe(wrong ? 'Not this time' : 'Right');
        if (wrong) await shot(page, 'phone', 'practice-wrong-answer', page.getByTestId('practice-result'));
        if (question.asked === 'verdict') {
          await page.getByTestId('replay-verdict').waitFor();
          if (i === 4) await shot(page, 'phone', 'practice-verdict-revealed', page.getByTestId('replay-spec-bar'));
        }
      }
      if (i === 1) await shot(page, 'phone', 'practice-second-step');
      if (i === 2) {
        await page.getByTestId('replay-diagram-toggle').click();
        await page.getByTestId('procedure-diagram').waitFor();
        await shot(page, 'phone', 'practice-diagram', page.getByTestId('procedure-diagram'));
        await page.getByTestId('replay-diagram-toggle').click();
      }
      await page.getByTestId('replay-next').click();
    }

    await page.getByTestId('practice-summary').waitFor();
    expect(await text(page, 'practice-score')).toBe(`${expectedRight} of ${asked} right`);
    expect(expectedRight).toBe(asked - 1);
    await shot(page, 'phone', 'practice-summary', page.getByTestId('practice-summary'));

    await page.getByTestId('practice-history').click();
    await page.getByTestId('practice-history-screen').waitFor();
    await page.getByTestId('practice-run-cards').waitFor();
    expect(await text(page, 'practice-total')).toBe(`1 pass · ${expectedRight} of ${asked} answers right (${Math.round((100 * expectedRight) / asked)} %)`);
    await shot(page, 'phone', 'practice-history-apprentice');
    await context.close();
  });

  it('reads in the dark theme, diagram included', async () => {
    const { context, page } = await openPage(browser, server.url, 'phone', 'dark');
    await signIn(page, demo('apprentice').email, DEMO_PASSWORD, 'replays');
    const fellrunner = await detail('Fellrunner');
    await page.getByTestId(`replay-watch-${fellrunner.id}`).click();
    await page.getByTestId('replay-step-1').waitFor();
    await shot(page, 'phone', 'replay-dark');
    await page.getByTestId('replay-next').click();
    await page.getByTestId('replay-diagram-toggle').click();
    await shot(page, 'phone', 'replay-dark-diagram', page.getByTestId('procedure-diagram'));
    await context.close();
  });
});

describe('a technician with no practice yet', () => {
  it('sees the empty practice history, and a replay that is not there says so', async () => {
    const { context, page } = await openPage(browser, server.url, 'phone');
    await signIn(page, demo('tech').email, DEMO_PASSWORD, 'bench');
    await page.goto('/replays/practice');
    await page.getByTestId('practice-empty').waitFor();
    await shot(page, 'phone', 'practice-history-empty');
    await page.goto('/replays/00000000-0000-4000-8000-000000000000');
    await page.getByTestId('replay-not-found').waitFor();
    await shot(page, 'phone', 'replay-not-found');
    await page.getByTestId('replay-not-found-back').click();
    await page.getByTestId('replays-cards').waitFor();
    await context.close();
  });
});

describe.each(['phone', 'desk'] as Size[])('accessibility at %s size', (size) => {
  it('has no serious violations in a replay, watching and practising', async () => {
    // axe is injected as a script, which the app's Content-Security-Policy rightly refuses; this context bypasses it.
    const context = await browser.newContext({ baseURL: server.url, viewport: SIZES[size], bypassCSP: true });
    const page = await context.newPage();
    await signIn(page, demo('apprentice').email, DEMO_PASSWORD, 'replays');
    const fellrunner = await detail('Fellrunner');
    for (const mode of ['watch', 'practice']) {
      await page.goto(`/replays/${fellrunner.id}?mode=${mode}`);
      await page.getByTestId('replay-step-1').waitFor();
      if (mode === 'practice') await page.getByTestId('practice-prompt').waitFor();
      else if (size === 'phone') await page.getByTestId('replay-diagram-toggle').click();
      await page.getByTestId('procedure-diagram').or(page.getByTestId('practice-prompt')).first().waitFor();
      await page.evaluate(() => document.fonts.ready);
      expect(await violations(page), `${mode} mode`).toEqual([]);
    }
    await page.goto('/replays/practice');
    await page.getByTestId('practice-history-screen').waitFor();
    expect(await violations(page), 'practice history').toEqual([]);
    await context.close();
  });
});

describe('a lead at a desk', () => {
  it('watches a replay with its detour beside the diagram and comments on a step', async () => {
    const { context, page } = await openPage(browser, server.url, 'desk');
    await signIn(page, demo('lead').email, DEMO_PASSWORD, 'bench');
    await page.getByTestId('nav-replays').click();
    await page.getByTestId('replays-table').waitFor();
    await shot(page, 'desk', 'replays-table-lead');

    const fellrunner = await detail('Fellrunner');
    await page.getByTestId(`replay-watch-${fellrunner.id}`).click();
    await page.getByTestId('replay-step-1').waitFor();
    await page.getByTestId('procedure-diagram').waitFor();
    await shot(page, 'desk', 'replay-first-step');

    const detour = fellrunner.steps.find((s) => s.retracted)!;
    for (let i = 1; i < detour.seq; i++) await page.getByTestId('replay-next').click();
    await page.getByTestId(`replay-step-${detour.seq}`).waitFor();
    await page.getByTestId('replay-retracted').waitFor();
    expect(await text(page, 'replay-step-position')).toBe(`STEP ${detour.seq} OF ${fellrunner.steps.length} · MEASURE`);
    await shot(page, 'desk', 'replay-detour');

    const comment = 'Read the display twice before typing: 4.1 and 0.41 Ω send you down different branches.';
    await page.getByTestId('comment-input').fill(comment);
    await page.getByTestId('comment-submit').click();
    await page.getByText(comment).waitFor();
    await shot(page, 'desk', 'replay-comment-added', page.getByTestId('step-comments'));

    await page.getByTestId('replay-next').click();
    await page.getByTestId(`replay-step-${detour.seq + 1}`).waitFor();
    expect(await page.getByTestId('replay-retracted').count()).toBe(0);
    for (let i = detour.seq + 1; i <= fellrunner.steps.length; i++) await page.getByTestId('replay-next').click();
    await page.getByTestId('replay-finding').waitFor();
    expect(await text(page, 'replay-finding')).toContain('Stator');
    await shot(page, 'desk', 'replay-finding');
    await page.getByTestId('diagram-whole').click();
    await shot(page, 'desk', 'replay-finding-whole-diagram');

    // The apprentice sees the comment on that step.
    const apprentice = await apiAs(server.url, demo('apprentice').email, DEMO_PASSWORD);
    const { comments } = await apprentice<{ comments: { stepSeq: number; body: string }[] }>(`/api/diagnoses/${fellrunner.id}/comments`);
    expect(comments).toEqual([expect.objectContaining({ stepSeq: detour.seq, body: comment })]);

    await page.goto('/replays/practice');
    await page.getByTestId('practice-members').waitFor();
    expect(await text(page, 'practice-members')).toContain('Inès Marchetti');
    await shot(page, 'desk', 'practice-history-team');
    await context.close();
  });
});

/** Calls the API as a member, for writes: the demo shop's technician runs diagnoses for the insight below. */
async function writerAs(email: string) {
  const signInResponse = await fetch(`${server.url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  const { token } = (await signInResponse.json()) as { token: string };
  return async <T>(method: 'GET' | 'POST', pathname: string, body?: object): Promise<T> => {
    const response = await fetch(`${server.url}${pathname}`, {
      method,
      headers: { Authorization: `Bearer ${token}`, 'Content-Type': 'application/json' },
      body: body ? JSON.stringify(body) : undefined,
    });
    if (!response.ok) throw new Error(`${method} ${pathname}: ${response.status} ${await response.text()}`);
    return (await response.json()) as T;
  };
}

/** Parked-drain diagnoses as typed at the bench (invented readings); the engine judges each step. */
const DRAIN_RUNS: { checkId: string; reading?: string; choiceId?: string }[][] = [
  [{ checkId: 'battery-ocv', reading: '12.62 V' }, { checkId: 'draw-setup' }, { checkId: 'draw-amps', reading: '2.1 mA' }],
  [{ checkId: 'battery-ocv', reading: '12.6' }, { checkId: 'draw-setup' }, { checkId: 'draw-amps', reading: '31 mA' }, { checkId: 'fuse-pull', choiceId: 'accessory' }, { checkId: 'accessory-loads', choiceId: 'grips' }],
  [{ checkId: 'battery-ocv', reading: '12.7 V' }, { checkId: 'draw-setup' }, { checkId: 'draw-amps', reading: '25 mA' }, { checkId: 'fuse-pull', choiceId: 'accessory' }, { checkId: 'accessory-loads', choiceId: 'usb' }],
  [{ checkId: 'battery-ocv', reading: '12.1 V' }, { checkId: 'charge-battery' }, { checkId: 'draw-setup' }, { checkId: 'draw-amps', reading: '40 mA' }, { checkId: 'fuse-pull', choiceId: 'ecu' }],
  [{ checkId: 'battery-ocv', reading: '12.65' }, { checkId: 'draw-setup' }, { checkId: 'draw-amps', reading: '18 mA' }, { checkId: 'fuse-pull', choiceId: 'none' }, { checkId: 'reg-unplug-draw', reading: '2 mA' }],
];

describe('a lead reading the insight at a desk', () => {
  it('sees counts, times, expectations and the diagram for a procedure version', async () => {
    const tech = await writerAs(demo('tech').email);
    const { procedures } = await tech<{ procedures: { id: string; title: string }[] }>('GET', '/api/procedures');
    const drain = procedures.find((p) => p.title.startsWith('Battery drains'))!;
    const { jobs } = await tech<{ jobs: { id: string }[] }>('GET', '/api/jobs');
    const { meters } = await tech<{ meters: { id: string }[] }>('GET', '/api/meters');
    for (const run of DRAIN_RUNS) {
      const { diagnosis } = await tech<{ diagnosis: { id: string } }>('POST', '/api/diagnoses', { procedureId: drain.id, jobId: jobs[0].id, meterId: meters[0].id, ambientC: 20 });
      for (const step of run) await tech('POST', `/api/diagnoses/${diagnosis.id}/steps`, step);
      await tech('POST', `/api/diagnoses/${diagnosis.id}/conclude`, { note: 'Found and fixed.' });
    }

    // Bypasses the Content-Security-Policy only so the accessibility audit below can inject axe.
    const context = await browser.newContext({ baseURL: server.url, viewport: SIZES.desk, bypassCSP: true });
    const page = await context.newPage();
    await signIn(page, demo('lead').email, DEMO_PASSWORD, 'bench');
    await page.getByTestId('nav-replays').click();
    await page.getByTestId('replays-insight').click();
    await page.getByTestId('insight-screen').waitFor();
    await page.getByTestId(`insight-procedure-${drain.id}`).click();
    await page.getByTestId('insight-report').waitFor();
    // The seeded Marra diagnosis and the five above.
    expect(await text(page, 'insight-count')).toContain('6');
    expect(await text(page, 'insight-findings')).toContain('USB socket drains the battery');
    expect(await page.getByTestId('procedure-diagram').count()).toBe(1);
    await shot(page, 'desk', 'insight');
    await shot(page, 'desk', 'insight-diagram', page.getByTestId('procedure-diagram'));
    expect(await violations(page)).toEqual([]);
    await context.close();
  });
});
