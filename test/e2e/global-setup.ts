import { execSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { ensureWebBuild } from '@server/web/build-web';

const ROOT = path.resolve(__dirname, '../..');
const CHROMIUM = '/usr/bin/chromium';

/** Browser tests need Debian's Chromium and a web export no older than the client sources. */
export default function setup() {
  if (!fs.existsSync(CHROMIUM)) {
    console.log('Installing Chromium from Debian…');
    execSync('apt-get update && apt-get install -y chromium', { stdio: 'inherit' });
  }
  ensureWebBuild(ROOT, (message) => console.log(message));
}
