import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { OLD_BUNDLE_GRACE_MS, pruneOldBundles } from '@server/web/build-web';

const dirs: string[] = [];
afterEach(() => {
  for (const d of dirs.splice(0)) fs.rmSync(d, { recursive: true, force: true });
});

/** A dist/ folder with files written at the given ages (ms before `now`). */
function distWith(now: number, files: Record<string, number>): string {
  const dist = fs.mkdtempSync(path.join(os.tmpdir(), 'probepath-dist-'));
  dirs.push(dist);
  for (const [rel, age] of Object.entries(files)) {
    const file = path.join(dist, rel);
    fs.mkdirSync(path.dirname(file), { recursive: true });
    fs.writeFileSync(file, rel);
    const at = new Date(now - age);
    fs.utimesSync(file, at, at);
  }
  return dist;
}

describe('pruning the scripts of earlier web builds', () => {
  const now = Date.parse('2026-12-02T12:00:00Z');
  const day = OLD_BUNDLE_GRACE_MS;
  const js = (name: string) => path.join('_expo', 'static', 'js', 'web', name);

  it('removes only scripts the newest build lacks and that are older than the grace period', () => {
    const dist = distWith(now, {
      [js('entry-new.js')]: 0,
      [js('entry-old.js')]: 2 * day,
      [js('editor-yesterday-morning.js')]: day + 1,
      [js('editor-an-hour-ago.js')]: 60 * 60 * 1000,
      'index.html': 2 * day,
      [path.join('assets', 'font-old.ttf')]: 2 * day,
    });
    // A file of the newest build is kept even when the copy kept an old time.
    const newest = new Set([js('entry-new.js'), js('entry-old.js'), 'index.html']);
    const removed = pruneOldBundles(dist, newest, now);
    expect(removed.sort()).toEqual([js('editor-yesterday-morning.js')]);
    expect(fs.existsSync(path.join(dist, js('editor-yesterday-morning.js')))).toBe(false);
    for (const kept of [js('entry-new.js'), js('entry-old.js'), js('editor-an-hour-ago.js'), 'index.html', path.join('assets', 'font-old.ttf')]) {
      expect(fs.existsSync(path.join(dist, kept)), kept).toBe(true);
    }
  });

  it('does nothing on a dist/ without scripts', () => {
    const dist = distWith(now, { 'index.html': 2 * day });
    expect(pruneOldBundles(dist, new Set(), now)).toEqual([]);
  });
});
