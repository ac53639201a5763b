import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const SOURCES = ['app', 'src', 'shared', 'fonts', 'app.json', 'package.json', 'metro.config.js'];
const LOCK_STALE_MS = 10 * 60 * 1000;
/** How long a replaced bundle stays for pages opened before the new build (they may still load its chunks). */
export const OLD_BUNDLE_GRACE_MS = 24 * 60 * 60 * 1000;

function newestMtime(p: string): number {
  if (!fs.existsSync(p)) return 0;
  const st = fs.statSync(p);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = st.mtimeMs;
  for (const entry of fs.readdirSync(p)) newest = Math.max(newest, newestMtime(path.join(p, entry)));
  return newest;
}

/** True when dist/index.html is missing or older than any client source. */
export function webBuildIsStale(root: string): boolean {
  const index = path.join(root, 'dist', 'index.html');
  if (!fs.existsSync(index)) return true;
  const built = fs.statSync(index).mtimeMs;
  return SOURCES.some((s) => newestMtime(path.join(root, s)) > built);
}

/** One build at a time across processes (a start and a test run may both want one). */
function withBuildLock(root: string, work: () => void) {
  const lock = path.join(root, '.web-build.lock');
  for (;;) {
    try {
      fs.mkdirSync(lock);
      break;
    } catch {
      const age = Date.now() - (fs.statSync(lock, { throwIfNoEntry: false })?.mtimeMs ?? Date.now());
      if (age > LOCK_STALE_MS) fs.rmSync(lock, { recursive: true, force: true });
      else Atomics.wait(new Int32Array(new SharedArrayBuffer(4)), 0, 0, 500);
    }
  }
  try {
    work();
  } finally {
    fs.rmSync(lock, { recursive: true, force: true });
  }
}

function filesUnder(dir: string, base = dir): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    return e.isDirectory() ? filesUnder(full, base) : [path.relative(base, full)];
  });
}

/**
 * Removes the hashed scripts of earlier builds from dist/_expo: those the newest build does not have and
 * that have not been written for `graceMs`. Younger ones stay, so a page opened before the new build can
 * still load its chunks. Returns the paths removed, relative to dist/.
 */
export function pruneOldBundles(dist: string, newest: ReadonlySet<string>, now = Date.now(), graceMs = OLD_BUNDLE_GRACE_MS): string[] {
  const removed: string[] = [];
  for (const rel of filesUnder(path.join(dist, '_expo')).map((f) => path.join('_expo', f))) {
    if (newest.has(rel)) continue;
    const file = path.join(dist, rel);
    if (now - fs.statSync(file).mtimeMs < graceMs) continue;
    fs.rmSync(file);
    removed.push(rel);
  }
  return removed;
}

/**
 * Runs `expo export --platform web` when dist/ is missing or stale. It exports
 * to a side folder and then copies bundles and assets before index.html, so a
 * server already serving dist/ keeps working; earlier builds' scripts go once
 * they are a day old (pruneOldBundles).
 */
export function ensureWebBuild(root: string, log: (msg: string) => void): void {
  if (!webBuildIsStale(root)) return;
  withBuildLock(root, () => {
    if (!webBuildIsStale(root)) return;
    log('Building the web app (expo export, about half a minute)…');
    const out = path.join(root, `.web-build-${process.pid}`);
    const expo = path.join(root, 'node_modules', '.bin', 'expo');
    const result = spawnSync(expo, ['export', '--platform', 'web', '--output-dir', path.basename(out)], {
      cwd: root,
      stdio: 'inherit',
      env: { ...process.env, EXPO_OFFLINE: '1', CI: '1', EXPO_NO_TELEMETRY: '1' },
    });
    if (result.status !== 0) {
      fs.rmSync(out, { recursive: true, force: true });
      throw new Error('The web build failed; see the output above.');
    }
    const dist = path.join(root, 'dist');
    fs.mkdirSync(dist, { recursive: true });
    const entries = fs.readdirSync(out).sort((a, b) => Number(a === 'index.html') - Number(b === 'index.html'));
    for (const entry of entries) fs.cpSync(path.join(out, entry), path.join(dist, entry), { recursive: true, force: true });
    const removed = pruneOldBundles(dist, new Set(filesUnder(out)));
    if (removed.length) log(`Removed ${removed.length} script files of web builds over a day old.`);
    fs.rmSync(out, { recursive: true, force: true });
  });
}
