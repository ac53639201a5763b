import fs from 'node:fs';
import path from 'node:path';

/** Pictures drawn for the tests (an invented connector), in each accepted format. */
const dir = path.resolve(__dirname, '../fixtures/photos');
export const JPEG = fs.readFileSync(path.join(dir, 'connector.jpg'));
export const PNG = fs.readFileSync(path.join(dir, 'connector.png'));
export const WEBP = fs.readFileSync(path.join(dir, 'connector.webp'));

/** Every file under a folder, as paths relative to it. */
export function filesUnder(root: string): string[] {
  if (!fs.existsSync(root)) return [];
  return fs.readdirSync(root, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile())
    .map((e) => path.relative(root, path.join(e.parentPath, e.name)));
}
