import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { type Browser, type BrowserContext, chromium, type Locator, type Page } from 'playwright-core';
import type { Role } from '@shared/auth/roles';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '@server/seed/demo-accounts';
import { spawnServer } from '../support/server-process';

const ROOT = path.resolve(__dirname, '../..');
const SHOTS = path.join(ROOT, 'screenshots');

export const SIZES = {
  phone: { width: 390, height: 844 },
  desk: { width: 1440, height: 900 },
} as const;
export type Size = keyof typeof SIZES;

/** A tablet held sideways and upright: checked for the lead's desk screens. */
export const TABLETS = {
  tablet: { width: 1024, height: 768 },
  tabletTall: { width: 820, height: 1180 },
} as const;
/** Any size a test opens a page at. */
export type PageSize = Size | keyof typeof TABLETS;
const VIEWPORTS = { ...SIZES, ...TABLETS };

export const demo = (role: Role) => DEMO_ACCOUNTS.find((a) => a.role === role)!;
export { DEMO_PASSWORD };

export interface RunningServer {
  url: string;
  stop(): Promise<void>;
}

/** The real server on a free port with a fresh data folder; resolves once it says it is ready. */
export async function startServer(): Promise<RunningServer> {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'probepath-e2e-'));
  const server = await spawnServer(dataDir, { JWT_SECRET: 'e2e-secret-'.padEnd(48, 'x') });
  return {
    url: server.url,
    stop: async () => {
      await server.kill('SIGTERM');
      fs.rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function openPage(
  browser: Browser,
  baseURL: string,
  size: PageSize,
  colorScheme: 'light' | 'dark' = 'light',
): Promise<{ context: BrowserContext; page: Page }> {
  const context = await browser.newContext({ baseURL, viewport: VIEWPORTS[size], colorScheme });
  const page = await context.newPage();
  return { context, page };
}

/**
 * Saves screenshots/<size>/<name>.png once web fonts are in. Pages scroll
 * inside the app, so `focus` scrolls the part worth seeing into view first.
 */
export async function shot(page: Page, size: PageSize, name: string, focus?: Locator) {
  await page.evaluate(() => document.fonts.ready);
  await focus?.scrollIntoViewIfNeeded();
  const dir = path.join(SHOTS, size);
  fs.mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}

/** Signs in through the form and waits for the first section the role lands on. */
export async function signIn(page: Page, email: string, password: string, landing: string) {
  await page.goto('/sign-in');
  await page.getByTestId('sign-in-email').fill(email);
  await page.getByTestId('sign-in-password').fill(password);
  await page.getByTestId('sign-in-submit').click();
  await page.waitForURL(`**/${landing}`);
}

/** The testIDs of the section buttons the shell shows, in order. */
export async function navSections(page: Page): Promise<string[]> {
  const ids = await page.locator('[role="navigation"] [data-testid^="nav-"]').evaluateAll((nodes) =>
    nodes.map((n) => n.getAttribute('data-testid')!.slice('nav-'.length)),
  );
  return ids.filter((id) => id !== 'account');
}

/**
 * Calls the API as a signed-in member, e.g. to read the owner's outbox or to set a scene up; GET unless a
 * method is given. A refused call throws with the server's answer, so a broken setup is plain to see.
 */
export async function apiAs(baseURL: string, email: string, password: string) {
  const signInResponse = await fetch(`${baseURL}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password }),
  });
  const { token } = (await signInResponse.json()) as { token: string };
  return async <T>(pathname: string, write?: { method: 'POST' | 'PUT' | 'PATCH' | 'DELETE'; body?: object }): Promise<T> => {
    const response = await fetch(`${baseURL}${pathname}`, {
      method: write?.method ?? 'GET',
      headers: { Authorization: `Bearer ${token}`, ...(write?.body ? { 'Content-Type': 'application/json' } : {}) },
      body: write?.body ? JSON.stringify(write.body) : undefined,
    });
    if (!response.ok) throw new Error(`${write?.method ?? 'GET'} ${pathname}: ${response.status} ${await response.text()}`);
    return (await response.json()) as T;
  };
}

const AXE_SOURCE = fs.readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');

/**
 * Serious and critical WCAG 2.2 A/AA violations on the page as it stands, per axe-core, each in words with
 * where it is. Evaluated through the browser's debugging channel, which the app's CSP does not govern.
 */
export async function seriousViolations(page: Page): Promise<string[]> {
  await page.evaluate(() => document.fonts.ready);
  await page.evaluate(`${AXE_SOURCE};0`);
  const { violations, passes } = await page.evaluate(async () => {
    type Result = { violations: { id: string; impact: string | null; help: string; nodes: { target: string[] }[] }[]; passes: unknown[] };
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<Result> } }).axe;
    const r = await axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa', 'wcag22aa'] } });
    return { violations: r.violations, passes: r.passes.length };
  });
  // A page that drew nothing would pass every rule.
  if (passes < 10) return [`only ${passes} rules passed: the page looks empty`];
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map((v) => `${v.id}: ${v.help} at ${v.nodes.map((n) => n.target.join(' ')).slice(0, 3).join(', ')}`);
}

