import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const SOURCES = ['app', 'src', 'shared', 'fonts', 'app.json', 'package.json', 'metro.config.js'];

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

/** Runs `expo export --platform web` into dist/ when the build is missing or stale. */
export function ensureWebBuild(root: string, log: (msg: string) => void): void {
  if (!webBuildIsStale(root)) return;
  log('Building the web app (expo export, about half a minute)…');
  const expo = path.join(root, 'node_modules', '.bin', 'expo');
  const result = spawnSync(expo, ['export', '--platform', 'web', '--output-dir', 'dist'], {
    cwd: root,
    stdio: 'inherit',
    env: { ...process.env, EXPO_OFFLINE: '1', CI: '1', EXPO_NO_TELEMETRY: '1' },
  });
  if (result.status !== 0) throw new Error('The web build failed; see the output above.');
}
