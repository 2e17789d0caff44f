import { fileURLToPath } from 'node:url';
import { isMainThread, parentPort, Worker } from 'node:worker_threads';
import type { ErrorCode } from '../../shared/schemas/common.js';
import { ApiError } from '../http/errors.js';

/**
 * Long work runs on a worker thread so that the event loop keeps answering requests (the rule for
 * every job that computes or writes for longer than a few milliseconds). A job is a module that
 * calls `serveJob(fn)`; the server runs it with `runJob(url, input)`. An ApiError thrown in the
 * job reaches the caller as the same ApiError (status, code, message, fields); anything else
 * rejects with the job's error message.
 *
 * Starting a worker costs a few hundred milliseconds (a new isolate loads the job's modules), so
 * one worker per job module stays warm for IDLE_MS after its last job; a job that finds it busy
 * gets a worker of its own, which ends afterwards.
 */

const IDLE_MS = 10 * 60_000;

type Outcome<T> =
  | { ok: true; value: T }
  | { ok: false; apiError: { status: number; code: ErrorCode; message: string; fields?: Record<string, string> } }
  | { ok: false; error: string };

/** The URL of a job module next to `from` (pass `import.meta.url`), with the caller's own extension (.ts under tsx and Vitest). */
export function jobUrl(from: string, name: string): URL {
  const extension = from.endsWith('.ts') ? '.ts' : '.js';
  return new URL(`./${name}${extension}`, from);
}

/**
 * A worker for a job written in TypeScript: it registers tsx and then imports the job (Node 20
 * does not apply `--import tsx` to a worker's own entry file), with the server's compiler options.
 */
const TSX_API = import.meta.resolve('tsx/esm/api');

function spawn(url: URL): Worker {
  if (!url.pathname.endsWith('.ts')) return new Worker(url);
  const bootstrap = `import(${JSON.stringify(TSX_API)}).then(({ register }) => { register(); return import(${JSON.stringify(url.href)}); });`;
  return new Worker(bootstrap, { eval: true, env: { TSX_TSCONFIG_PATH: fileURLToPath(new URL('../../tsconfig.node.json', import.meta.url)), ...process.env } });
}

interface Warm {
  worker: Worker;
  busy: boolean;
  timer: NodeJS.Timeout | null;
}

const warm = new Map<string, Warm>();

function run<O>(worker: Worker, name: string, input: unknown): Promise<O> {
  return new Promise<O>((resolve, reject) => {
    const settle = () => {
      worker.off('message', onMessage);
      worker.off('error', onError);
      worker.off('exit', onExit);
    };
    const onMessage = (outcome: Outcome<O>) => {
      settle();
      if (outcome.ok) resolve(outcome.value);
      else if ('apiError' in outcome) reject(new ApiError(outcome.apiError.status, outcome.apiError.code, outcome.apiError.message, outcome.apiError.fields));
      else reject(new Error(outcome.error));
    };
    const onError = (err: Error) => {
      settle();
      reject(err);
    };
    const onExit = (code: number) => {
      settle();
      reject(new Error(`The job ${name} stopped (exit code ${code}) without an answer.`));
    };
    worker.on('message', onMessage);
    worker.on('error', onError);
    worker.on('exit', onExit);
    worker.postMessage(input);
  });
}

function keepWarm(url: URL): Warm {
  const slot: Warm = { worker: spawn(url), busy: false, timer: null };
  slot.worker.unref();
  slot.worker.once('exit', () => warm.get(url.href) === slot && warm.delete(url.href));
  warm.set(url.href, slot);
  return slot;
}

export async function runJob<I, O>(url: URL, input: I): Promise<O> {
  const name = url.pathname.split('/').pop()!;
  const found = warm.get(url.href);
  if (found?.busy) {
    const worker = spawn(url);
    try {
      return await run<O>(worker, name, input);
    } finally {
      void worker.terminate();
    }
  }
  const slot = found ?? keepWarm(url);
  slot.busy = true;
  if (slot.timer) clearTimeout(slot.timer);
  try {
    return await run<O>(slot.worker, name, input);
  } finally {
    slot.busy = false;
    slot.timer = setTimeout(() => void slot.worker.terminate(), IDLE_MS).unref();
  }
}

/** The body of a job module: runs `work` on each input the server sends and answers its outcome. */
export function serveJob<I, O>(work: (input: I) => O | Promise<O>): void {
  if (isMainThread || !parentPort) throw new Error('A job module runs on a worker thread (see runJob).');
  const port = parentPort;
  port.on('message', async (input: I) => {
    let outcome: Outcome<O>;
    try {
      outcome = { ok: true, value: await work(input) };
    } catch (err) {
      if (err instanceof ApiError) outcome = { ok: false, apiError: { status: err.status, code: err.code, message: err.message, ...(err.fields ? { fields: err.fields } : {}) } };
      else outcome = { ok: false, error: err instanceof Error ? (err.stack ?? err.message) : String(err) };
    }
    port.postMessage(outcome);
  });
}
