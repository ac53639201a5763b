import { readJSON, writeJSON } from '@/lib/device-storage';

/** What this device used to start its last diagnosis, offered again as the default. */
const KEY = 'probepath.last-start';

interface LastStart {
  meterId: string;
  ambientC: number;
}

export function readLastStart(): LastStart | null {
  return readJSON<LastStart>(KEY);
}

export function keepLastStart(last: LastStart): void {
  writeJSON(KEY, last);
}
