import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

const root = fileURLToPath(new URL('../..', import.meta.url));

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => resolve(port));
    });
    srv.on('error', reject);
  });
}

/** Starts the built service (which serves the built UI) on a fresh PGlite data folder. */
export default async function setup(project: TestProject) {
  const main = join(root, 'service/dist/main.js');
  if (!existsSync(main) || !existsSync(join(root, 'ui/dist/index.html'))) {
    throw new Error('Build first: `npm run build` (the browser tests run the built app).');
  }
  const dataDir = mkdtempSync(join(tmpdir(), 'poreline-e2e-'));
  const port = await freePort();
  const child: ChildProcess = spawn(process.execPath, [main], {
    cwd: root,
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, DEMO_MODE: 'true' },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout?.on('data', (b) => (log += b));
  child.stderr?.on('data', (b) => (log += b));
  const baseUrl = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 120_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`service exited with ${child.exitCode}:\n${log}`);
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) throw new Error(`service did not answer /api/health within 120 s:\n${log}`);
    await new Promise((r) => setTimeout(r, 300));
  }
  project.provide('baseUrl', baseUrl);
  return async () => {
    child.kill('SIGTERM');
    await new Promise((r) => child.once('exit', r));
    rmSync(dataDir, { recursive: true, force: true });
  };
}
