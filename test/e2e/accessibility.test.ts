import fs from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, SIZES, demo, launchBrowser, signIn, startServer, type RunningServer, type Size } from './support';

/**
 * An automated accessibility audit (axe-core, the open WCAG rule engine) of
 * each main screen at both sizes: no serious or critical violations.
 */
const AXE = fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

interface Violation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[] }[];
}

async function audit(page: Page): Promise<Violation[]> {
  await page.evaluate(() => document.fonts.ready);
  await page.addScriptTag({ content: AXE });
  const result = await page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<{ violations: Violation[]; passes: unknown[] }> } }).axe;
    return axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'] } });
  });
  // A page that rendered nothing would pass every rule vacuously.
  expect(result.passes.length).toBeGreaterThan(10);
  return result.violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

const describeViolations = (vs: Violation[]) => vs.map((v) => `${v.id}: ${v.help} at ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(', ')}`).join('\n');

/** The audit injects axe as a script, which the app's Content-Security-Policy rightly refuses; the audit context bypasses it. */
async function openAuditPage(size: Size) {
  const context = await browser.newContext({ baseURL: server.url, viewport: SIZES[size], bypassCSP: true });
  return { context, page: await context.newPage() };
}

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
    const { context, page } = await openAuditPage(size);
    await page.goto('/sign-in');
    await page.getByTestId('sign-in-email').waitFor();
    const violations = await audit(page);
    expect(violations, describeViolations(violations)).toEqual([]);
    await context.close();
  });

  it.each(SCREENS)('has none on the screens of the $role', async ({ role, landing, paths }) => {
    const { context, page } = await openAuditPage(size);
    await signIn(page, demo(role).email, DEMO_PASSWORD, landing);
    for (const p of paths) {
      await page.goto(p);
      await page.waitForLoadState('networkidle');
      const violations = await audit(page);
      expect(violations, `${p}\n${describeViolations(violations)}`).toEqual([]);
    }
    await context.close();
  });
});
