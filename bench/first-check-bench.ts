/**
 * How long the phone takes to show the first check of an open diagnosis, cold,
 * in Chromium at 390×844 with the CPU slowed 4×, beside a baseline measured in
 * the same run: a blank page that paints one line of text under the same
 * slowdown, and how much JavaScript the page loaded. Run with `npm run bench`;
 * the target is under 2 s.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { ensureWebBuild } from '../server/web/build-web';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../server/seed/demo-accounts';
import { launchBrowser } from '../test/e2e/support';
import { spawnServer } from '../test/support/server-process';

const RUNS = 5;
const SLOWDOWN = 4;
const ROOT = path.resolve(__dirname, '..');

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

async function main() {
  ensureWebBuild(ROOT, (m) => console.log(m));
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'probepath-first-check-'));
  const server = await spawnServer(dataDir);
  const browser = await launchBrowser();
  try {
    const tech = DEMO_ACCOUNTS.find((a) => a.role === 'tech')!;
    const signIn = await fetch(`${server.url}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: tech.email, password: DEMO_PASSWORD }) });
    const { token } = (await signIn.json()) as { token: string };
    const open = await fetch(`${server.url}/api/diagnoses?status=open`, { headers: { authorization: `Bearer ${token}` } });
    const { diagnoses } = (await open.json()) as { diagnoses: { id: string }[] };
    if (!diagnoses.length) throw new Error('The demo shop has no open diagnosis to resume.');

    const measure = async (url: string, ready: string, withToken: boolean) => {
      const context = await browser.newContext({ viewport: { width: 390, height: 844 } });
      if (withToken) await context.addInitScript((t) => window.localStorage.setItem('probepath.session-token', t), token);
      const page = await context.newPage();
      const cdp = await context.newCDPSession(page);
      await cdp.send('Emulation.setCPUThrottlingRate', { rate: SLOWDOWN });
      const started = Date.now();
      await page.goto(url);
      await page.getByTestId(ready).waitFor({ state: 'visible', timeout: 30_000 });
      const ms = Date.now() - started;
      const js = await page.evaluate(() =>
        performance
          .getEntriesByType('resource')
          .filter((e) => (e as PerformanceResourceTiming).initiatorType === 'script')
          .map((e) => ({ bytes: (e as PerformanceResourceTiming).decodedBodySize, wire: (e as PerformanceResourceTiming).transferSize })),
      );
      await context.close();
      return { ms, js };
    };

    const baseline: number[] = [];
    const firstCheck: number[] = [];
    const blank = `data:text/html,<!doctype html><meta name=viewport content="width=device-width"><body><script>document.addEventListener('DOMContentLoaded',()=>{const d=document.createElement('div');d.dataset.testid='ready';d.textContent='ready';document.body.append(d)})</script>`;
    let scripts: { bytes: number; wire: number }[] = [];
    for (let i = 0; i < RUNS; i++) {
      baseline.push((await measure(blank, 'ready', false)).ms);
      const run = await measure(`${server.url}/bench/diagnosis/${diagnoses[0].id}`, 'check-title', true);
      firstCheck.push(run.ms);
      scripts = run.js;
    }
    const b = median(baseline);
    const f = median(firstCheck);
    console.log(`\nFirst check on a phone (390×844, CPU ${SLOWDOWN}× slower, cold cache), median of ${RUNS}`);
    console.log(`  blank page baseline       ${String(b).padStart(6)} ms`);
    console.log(`  first check of a diagnosis ${String(f).padStart(5)} ms   (${(f / b).toFixed(1)}× the baseline; target < 2000 ms: ${f < 2000 ? 'met' : 'NOT met'})`);
    console.log(`  runs: baseline ${baseline.join(', ')} ms; first check ${firstCheck.join(', ')} ms`);
    const kb = (n: number) => Math.round(n / 1024);
    const sum = (key: 'bytes' | 'wire') => scripts.reduce((total, s) => total + s[key], 0);
    console.log(`  JavaScript the page loaded: ${scripts.length} files, ${kb(sum('bytes'))} KB (${kb(sum('wire'))} KB over the wire)`);
  } finally {
    await browser.close();
    await server.kill('SIGTERM');
    fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
