// What the HTTP benchmarks share: the real server on a prepared data folder, a signed-in session,
// and p50/p95 of requests made one at a time from outside.
import { spawn } from 'node:child_process';

export const BENCH_EMAIL = 'bench@example.test';
export const BENCH_PASSWORD = 'bench-only-password-not-secret';

function percentile(sorted: number[], p: number) {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

export async function startServer(dataDir: string, port: number, env: Record<string, string> = {}) {
  const child = spawn('node_modules/.bin/tsx', ['--tsconfig', 'tsconfig.node.json', 'server/index.ts'], {
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, SEED_ON_START: 'false', FAKE_SMTP_PORT: '0', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout.on('data', (d) => (output += d));
  child.stderr.on('data', (d) => (output += d));
  const started = Date.now();
  while (Date.now() - started < 60_000) {
    if (await fetch(`http://127.0.0.1:${port}/api/v1/health`).then((r) => r.ok, () => false)) return child;
    if (child.exitCode !== null) break;
    await new Promise((r) => setTimeout(r, 200));
  }
  child.kill();
  throw new Error(`The server did not start:\n${output}`);
}

export async function signIn(base: string) {
  const csrfRes = await fetch(`${base}/api/v1/auth/csrf`);
  const cookie = csrfRes.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  const { csrfToken } = (await csrfRes.json()) as { csrfToken: string };
  const res = await fetch(`${base}/api/v1/auth/login`, { method: 'POST', headers: { 'content-type': 'application/json', 'x-csrf-token': csrfToken, cookie }, body: JSON.stringify({ email: BENCH_EMAIL, password: BENCH_PASSWORD }) });
  if (!res.ok) throw new Error(`sign-in failed: ${res.status} ${await res.text()}`);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

export async function time(base: string, cookie: string, urls: string[]) {
  const ms: number[] = [];
  let results = 0;
  for (const url of urls) {
    const started = process.hrtime.bigint();
    const res = await fetch(`${base}${url}`, { headers: { cookie, accept: 'application/json' } });
    const body = (await res.json()) as { total?: number; compartments?: unknown[] };
    ms.push(Number(process.hrtime.bigint() - started) / 1e6);
    if (!res.ok) throw new Error(`${url}: ${res.status} ${JSON.stringify(body)}`);
    results += (body.total ?? body.compartments?.length ?? 0) > 0 ? 1 : 0;
  }
  ms.sort((a, b) => a - b);
  return { p50: percentile(ms, 50), p95: percentile(ms, 95), max: ms[ms.length - 1]!, withResults: results };
}

