import { spawn, execSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

async function waitForHealth(url: string, child: ChildProcess, log: () => string) {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${log()}`);
    try {
      const res = await fetch(`${url}/api/v1/health`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`server did not answer in time:\n${log()}`);
}

/** Starts the real server (built client, demo seed, fake mail) on a fresh data folder. */
export default async function setup(project: TestProject) {
  if (!existsSync('dist/index.html')) execSync('npx vite build', { stdio: 'inherit' });
  if (!existsSync('/usr/bin/chromium')) throw new Error('Chromium is missing: apt-get install -y chromium (see .ci/run).');
  const dataDir = mkdtempSync(path.join(tmpdir(), 'shipkeeper-e2e-'));
  const port = await freePort();
  const baseUrl = `http://127.0.0.1:${port}`;
  let output = '';
  const child = spawn(path.resolve('node_modules/.bin/tsx'), ['--tsconfig', 'tsconfig.node.json', 'server/index.ts'], {
    env: {
      ...process.env,
      NODE_ENV: 'development',
      HOST: '127.0.0.1',
      PORT: String(port),
      PUBLIC_URL: baseUrl,
      DATA_DIR: dataDir,
      UPLOADS_DIR: path.join(dataDir, 'uploads'),
      FAKE_SMTP_PORT: '0',
      BCRYPT_COST: '8',
      CSRF_LIMIT_PER_MINUTE: '1000',
      SMTP_HOST: '',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout?.on('data', (d) => (output += d));
  child.stderr?.on('data', (d) => (output += d));
  await waitForHealth(baseUrl, child, () => output);
  project.provide('baseUrl', baseUrl);
  return async () => {
    child.kill('SIGTERM');
    await new Promise((r) => setTimeout(r, 300));
    rmSync(dataDir, { recursive: true, force: true });
  };
}
