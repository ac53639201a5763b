import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';

const ROOT = path.resolve(__dirname, '../..');

export interface ServerProcess {
  url: string;
  child: ChildProcess;
  /** Sends the signal and resolves once the process has exited. */
  kill(signal?: NodeJS.Signals): Promise<void>;
}

/** Runs the real server (`tsx server/index.ts`) on a free port over `dataDir`; resolves once it is ready. */
export function spawnServer(dataDir: string, env: Record<string, string> = {}): Promise<ServerProcess> {
  // Node itself with tsx as a loader, not the tsx wrapper: a signal must reach the server, not a parent that orphans it.
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env: { ...process.env, PORT: '0', DATA_DIR: dataDir, JWT_SECRET: 'process-test-secret-'.padEnd(48, 'x'), BUILD_WEB: '0', LOG_LEVEL: 'warn', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  const kill = (signal: NodeJS.Signals = 'SIGTERM') =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null || child.signalCode !== null) return resolve();
      child.once('exit', () => resolve());
      child.kill(signal);
    });
  let output = '';
  return new Promise((resolve, reject) => {
    const timer = setTimeout(() => {
      void kill('SIGKILL');
      reject(new Error(`The server did not say it was ready within 60 s:\n${output}`));
    }, 60_000);
    const read = (chunk: Buffer) => {
      output += chunk.toString();
      const ready = /Probepath is ready at (http:\/\/localhost:\d+)/.exec(output);
      if (ready) {
        clearTimeout(timer);
        resolve({ url: ready[1], child, kill });
      }
    };
    child.stdout!.on('data', read);
    child.stderr!.on('data', read);
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`The server exited with ${code} before it was ready:\n${output}`));
    });
  });
}
