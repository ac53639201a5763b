import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DiagnosisDetail, DiagnosisSummary } from '@shared/api/diagnosis-types';
import type { MeasureCheck } from '@shared/engine/procedure';
import { explainEvaluation } from '@shared/engine/explain';
import { practiceQuestions } from '@shared/practice/questions';
import { PNG } from '../support/photos';
import { apiAs, DEMO_PASSWORD, demo, launchBrowser, openPage, type RunningServer, seriousViolations, shot, signIn, type Size, startServer } from './support';

let server: RunningServer;
let browser: Browser;
let diagnoses: DiagnosisSummary[];
/** A hand-written demo story, by its customer (the generated diagnoses run on the same models). */
const detail = async (customer: string) => {
  const api = await apiAs(server.url, demo('lead').email, DEMO_PASSWORD);
  const id = diagnoses.find((d) => d.customerName === customer)!.id;
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

describe('an apprentice on a phone', () => {
  it('filters the replays, then practises a whole replay and is scored by the server', async () => {
    const { context, page } = await openPage(browser, server.url, 'phone');
    await signIn(page, demo('apprentice').email, DEMO_PASSWORD, 'replays');
    await page.getByTestId('replays-cards').waitFor();
    const total = diagnoses.length;
    expect(total).toBeGreaterThan(40);
    expect(await text(page, 'replays-count')).toBe(`${total} concluded diagnoses`);
    await shot(page, 'phone', 'replays-list-apprentice');

    await page.getByTestId('filter-machine').click();
    await shot(page, 'phone', 'replays-filter-open', page.getByTestId('replay-filters'));
    await page.getByTestId('filter-machine-Veltro Tessa 650').click();
    const onTessas = diagnoses.filter((d) => d.machine.endsWith('Veltro Tessa 650')).length;
    expect(onTessas).toBeGreaterThan(1);
    expect(await text(page, 'replays-count')).toBe(`${onTessas} of ${total} match the filters`);
    await page.getByTestId('filter-dates').click();
    await page.getByTestId('filter-from').fill('2020-02-30');
    expect(await page.getByTestId('filter-dates-apply').getAttribute('aria-disabled')).toBe('true');
    await page.getByTestId('filter-from').fill('2020-01-01');
    await page.getByTestId('filter-to').fill('2020-12-31');
    await page.getByTestId('filter-dates-apply').click();
    await page.getByTestId('replays-no-match').waitFor();
    await shot(page, 'phone', 'replays-no-match');
    await page.getByTestId('replays-clear').click();
    expect(await text(page, 'replays-count')).toBe(`${total} concluded diagnoses`);

    const tessa = await detail('Gethin Marlowe');
    // The technician photographed the corroded connector at the marginal reading.
    const photographed = tessa.steps.find((st) => st.checkId === 'sensor-resistance' && st.verdict === 'marginal')!;
    await uploadPhoto(tessa.id, photographed.id);
    await page.getByTestId(`replay-practise-${tessa.id}`).click();
    await page.getByTestId('replay-step-1').waitFor();
    await shot(page, 'phone', 'practice-first-question');

    // Answer every question: right, except the verdict on the first marginal reading. Step on with → (and
    // try ←, Home and End on the way), as a learner with a keyboard would.
    let expectedRight = 0;
    let asked = 0;
    for (const [i, step] of tessa.steps.entries()) {
      await page.getByTestId(`replay-step-${step.seq}`).waitFor();
      const question = practiceQuestions(tessa.document, step)[0];
      if (question) {
        asked += 1;
        expect(await page.getByTestId('replay-verdict').count()).toBe(0);
        expect(await page.getByTestId('replay-next').getAttribute('aria-disabled')).toBe('true');
        // → waits for the answer, like the button; End never skips practice questions.
        await page.keyboard.press('ArrowRight');
        await page.keyboard.press('End');
        expect(await page.getByTestId(`replay-step-${step.seq}`).count()).toBe(1);
        expect(await page.getByTestId('practice-prompt').count()).toBe(1);
        const wrong = question.asked === 'verdict' && step.verdict === 'marginal' && expectedRight === asked - 1;
        const choice = wrong ? question.choices.find((c) => c.value !== question.expected)!.value : question.expected;
        if (!wrong) expectedRight += 1;
        await page.getByTestId(`practice-choice-${choice}`).click();
        await page.getByTestId('practice-result').waitFor();
        expect(await text(page, 'practice-result-word')).toBe(wrong ? 'Not this time' : 'Right');
        if (wrong) await shot(page, 'phone', 'practice-wrong-answer', page.getByTestId('practice-result'));
        if (question.asked === 'verdict') {
          await page.getByTestId('replay-verdict').waitFor();
          // The reasons are given once, in the verdict panel, not again in the result.
          const check = tessa.document.checks.find((c) => c.id === step.checkId) as MeasureCheck;
          const reasons = explainEvaluation(check.spec, step.evaluation!, check.quantity);
          expect(await page.getByText(reasons, { exact: true }).count()).toBe(1);
          if (i === 4) await shot(page, 'phone', 'practice-verdict-revealed', page.getByTestId('replay-spec-bar'));
        }
      }
      if (step.id === photographed.id) {
        // The step's photo shows once the step is revealed, and opens large.
        await page.getByTestId('replay-photos').waitFor();
        expect(await page.getByTestId('replay-photos').getByRole('button', { name: /^Photo 1 of Pulse coil/ }).count()).toBe(1);
        // The bytes come with the session's token; the picture replaces its placeholder once loaded.
        await page.getByTestId('replay-photos').locator('img').waitFor({ state: 'attached' });
        await page.getByTestId('replay-photos').scrollIntoViewIfNeeded();
        await shot(page, 'phone', 'practice-step-photo');
        await page.getByTestId('replay-photo-0').click();
        await shot(page, 'phone', 'practice-step-photo-large');
        await page.getByTestId('replay-photo-close').click();
      } else {
        expect(await page.getByTestId('replay-photos').count()).toBe(0);
      }
      if (i === 1) {
        await shot(page, 'phone', 'practice-second-step');
        // ← goes back to the answered first step, Home too; → returns.
        await page.keyboard.press('ArrowLeft');
        await page.getByTestId(`replay-step-${tessa.steps[0].seq}`).waitFor();
        await page.keyboard.press('ArrowRight');
        await page.getByTestId(`replay-step-${step.seq}`).waitFor();
        await page.keyboard.press('Home');
        await page.getByTestId(`replay-step-${tessa.steps[0].seq}`).waitFor();
        await page.keyboard.press('ArrowRight');
        await page.getByTestId(`replay-step-${step.seq}`).waitFor();
      }
      if (i === 2) {
        await page.getByTestId('replay-diagram-toggle').click();
        await page.getByTestId('procedure-diagram').waitFor();
        await shot(page, 'phone', 'practice-diagram', page.getByTestId('procedure-diagram'));
        await page.getByTestId('replay-diagram-toggle').click();
      }
      await page.keyboard.press('ArrowRight');
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
    const fellrunner = await detail('Bram Visser');
    await page.getByTestId(`replay-watch-${fellrunner.id}`).click();
    await page.getByTestId('replay-step-1').waitFor();
    await shot(page, 'phone', 'replay-dark');
    await page.getByTestId('replay-next').click();
    await page.getByTestId('replay-diagram-toggle').click();
    await shot(page, 'phone', 'replay-dark-diagram', page.getByTestId('procedure-diagram'));
    await context.close();
  });
});

describe('an apprentice at a desk', () => {
  it('sees the seeded photo of the meter on the step that decided a generated diagnosis', async () => {
    const api = await apiAs(server.url, demo('apprentice').email, DEMO_PASSWORD);
    // A generated diagnosis: its photo is on the last step, the one that decided it (a hand-written story
    // may carry a photo elsewhere on its path).
    let photographed: DiagnosisDetail | undefined;
    for (const d of diagnoses) {
      const { diagnosis } = await api<{ diagnosis: DiagnosisDetail }>(`/api/diagnoses/${d.id}`);
      const last = diagnosis.steps.filter((st) => !st.retracted).at(-1);
      if (last && diagnosis.photos.some((p) => p.stepId === last.id)) {
        photographed = diagnosis;
        break;
      }
    }
    const step = photographed!.steps.find((st) => st.id === photographed!.photos[0].stepId)!;
    const { context, page } = await openPage(browser, server.url, 'desk');
    await signIn(page, demo('apprentice').email, DEMO_PASSWORD, 'replays');
    await page.goto(`/replays/${photographed!.id}`);
    await page.getByTestId('replay-step-1').waitFor();
    // End goes to the finding, ← back to the step that led to it.
    await page.keyboard.press('End');
    await page.getByTestId('replay-finding').waitFor();
    await page.keyboard.press('ArrowLeft');
    await page.getByTestId(`replay-step-${step.seq}`).waitFor();
    await page.getByTestId('replay-photos').locator('img').waitFor({ state: 'attached' });
    await page.getByTestId('replay-photos').scrollIntoViewIfNeeded();
    await shot(page, 'desk', 'replay-seeded-photo');
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
    const { context, page } = await openPage(browser, server.url, size);
    await signIn(page, demo('apprentice').email, DEMO_PASSWORD, 'replays');
    const fellrunner = await detail('Bram Visser');
    for (const mode of ['watch', 'practice']) {
      await page.goto(`/replays/${fellrunner.id}?mode=${mode}`);
      await page.getByTestId('replay-step-1').waitFor();
      if (mode === 'practice') await page.getByTestId('practice-prompt').waitFor();
      else if (size === 'phone') await page.getByTestId('replay-diagram-toggle').click();
      await page.getByTestId('procedure-diagram').or(page.getByTestId('practice-prompt')).first().waitFor();
      await page.evaluate(() => document.fonts.ready);
      expect(await seriousViolations(page), `${mode} mode`).toEqual([]);
    }
    await page.goto('/replays/practice');
    await page.getByTestId('practice-history-screen').waitFor();
    expect(await seriousViolations(page), 'practice history').toEqual([]);
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

    const fellrunner = await detail('Bram Visser');
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
    // The shortcuts are named at a desk; keys typed into the comment stay in it.
    expect(await text(page, 'replay-keys')).toBe('Keys: ← previous · → next · Home first step · End finding');
    await page.getByTestId('comment-input').fill(comment);
    await page.getByTestId('comment-input').press('ArrowLeft');
    await page.getByTestId('comment-input').press('Home');
    expect(await text(page, 'replay-step-position')).toBe(`STEP ${detour.seq} OF ${fellrunner.steps.length} · MEASURE`);
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

/** A photo on a step of a concluded diagnosis, as a technician adds one for the record. */
async function uploadPhoto(diagnosisId: string, stepId: string) {
  const signInResponse = await fetch(`${server.url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email: demo('tech').email, password: DEMO_PASSWORD }),
  });
  const { token } = (await signInResponse.json()) as { token: string };
  const form = new FormData();
  form.append('stepId', stepId);
  form.append('photo', new Blob([new Uint8Array(PNG)], { type: 'image/png' }), 'photo');
  const res = await fetch(`${server.url}/api/diagnoses/${diagnosisId}/photos`, { method: 'POST', headers: { Authorization: `Bearer ${token}` }, body: form });
  expect(res.status).toBe(201);
}

describe('a lead reading the insight at a desk', () => {
  it('sees counts, times, expectations and the diagram for a procedure version', async () => {
    // The seeded diagnoses are enough to read: the hand-written Marra story and the generated ones.
    const lead = await apiAs(server.url, demo('lead').email, DEMO_PASSWORD);
    const { procedures } = await lead<{ procedures: { id: string; title: string }[] }>('/api/procedures');
    const drain = procedures.find((p) => p.title.startsWith('Battery drains'))!;
    const onDrain = diagnoses.filter((d) => d.procedureId === drain.id && d.versionNumber === 1);
    expect(onDrain.length).toBeGreaterThanOrEqual(8);

    const { context, page } = await openPage(browser, server.url, 'desk');
    await signIn(page, demo('lead').email, DEMO_PASSWORD, 'bench');
    await page.getByTestId('nav-replays').click();
    await page.getByTestId('replays-insight').click();
    await page.getByTestId('insight-screen').waitFor();
    await page.getByTestId(`insight-procedure-${drain.id}`).click();
    await page.getByTestId('insight-report').waitFor();
    expect(await text(page, 'insight-count')).toContain(String(onDrain.length));
    expect(await text(page, 'insight-findings')).toContain('USB socket drains the battery');
    expect(await page.getByTestId('procedure-diagram').count()).toBe(1);
    // With no step to follow, the close-up opens on the start check, across the middle of the pane.
    const pane = (await page.getByTestId('procedure-diagram').boundingBox())!;
    await expect
      .poll(async () => {
        const start = (await page.getByTestId('procedure-diagram').getByText('Battery rested', { exact: false }).first().boundingBox())!;
        return Math.abs(start.x + start.width / 2 - (pane.x + pane.width / 2)) < pane.width / 4;
      })
      .toBe(true);
    await shot(page, 'desk', 'insight');
    await shot(page, 'desk', 'insight-diagram', page.getByTestId('procedure-diagram'));
    expect(await seriousViolations(page)).toEqual([]);
    await context.close();
  });
});
