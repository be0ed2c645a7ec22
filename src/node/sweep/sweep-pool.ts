import { Worker } from 'node:worker_threads';
import { startSweepWork, type Ready, type SweepSetup, type WorkReply, type WorkRequest } from './sweep-work.ts';

// The threads a sweep runs on: `jobs` worker threads, each with its own
// checker, or, for one job, the command's own thread (nothing to start).
// Each lane takes one request at a time; the caller hands out the work.

export interface Lane {
  request(req: WorkRequest): Promise<WorkReply>;
}

/**
 * A point allocates much that dies young (a prepared spec, the findings it
 * re-checks); a young generation larger than the default is collected less
 * often (4,000 points checked in one thread with 64 MB semi-spaces took
 * about a fifth less CPU than with the default, on a loaded machine).
 */
const YOUNG_MB = 96;

export type Pool = { ok: true; lanes: Lane[]; ready: Ready; close(): Promise<void> } | { ok: false; reason: string };

/**
 * This module's address as Node loaded it. Written with brackets so the
 * bundler's rewrite (scripts/bundle.ts points each module's own address back
 * at its source) leaves it alone: from the bundle it is a chunk in the
 * bundle's folder, where the worker's own entry lies beside it.
 */
const loadedFrom: string = import.meta['url'];

/** The worker's start: from the source, through a starter that registers tsx; from the bundle, its own entry. */
function workerStart(setup: SweepSetup): { url: URL; workerData: { setup: SweepSetup; entry?: string } } {
  if (loadedFrom.endsWith('.ts')) return { url: new URL('./ts-worker.mjs', loadedFrom), workerData: { setup, entry: new URL('./sweep-worker.ts', loadedFrom).href } };
  return { url: new URL('./sweep-worker.mjs', loadedFrom), workerData: { setup } };
}

export async function startPool(setup: SweepSetup, jobs: number): Promise<Pool> {
  if (jobs <= 1) {
    const work = await startSweepWork(setup);
    if (!work.ok) return work;
    // Each request waits a turn of the event loop, so Ctrl-C and the progress bar are seen between them.
    const lane: Lane = { request: (req) => new Promise((resolve) => setImmediate(() => resolve(work.handle(req)))) };
    return { ok: true, lanes: [lane], ready: work.ready, close: () => Promise.resolve() };
  }
  const start = workerStart(setup);
  const workers = Array.from({ length: jobs }, () => new Worker(start.url, { workerData: start.workerData, resourceLimits: { maxYoungGenerationSizeMb: YOUNG_MB } }));
  const close = async () => {
    await Promise.all(workers.map((w) => w.terminate()));
  };
  try {
    const started = await Promise.all(workers.map(startLane));
    const refused = started.find((s): s is { refused: string } => 'refused' in s);
    if (refused) {
      await close();
      return { ok: false, reason: refused.refused };
    }
    const lanes = started.map((s) => (s as { lane: Lane }).lane);
    return { ok: true, lanes, ready: (started[0] as { ready: Ready }).ready, close };
  } catch (e) {
    await close();
    throw e;
  }
}

type Started = { lane: Lane; ready: Ready } | { refused: string };

/** A worker's first message says whether it is ready; after that each request has its reply. */
function startLane(worker: Worker): Promise<Started> {
  return new Promise((resolveStart, rejectStart) => {
    const waiting = new Map<number, { resolve(r: WorkReply): void; reject(e: Error): void }>();
    let next = 0;
    let started = false;
    const fail = (e: Error) => {
      if (!started) rejectStart(e);
      for (const w of waiting.values()) w.reject(e);
      waiting.clear();
    };
    worker.on('error', fail);
    worker.on('exit', (code) => fail(new Error(`a sweep thread stopped (exit code ${code})`)));
    worker.on('message', (m: { ready?: Ready; refused?: string; id?: number; reply?: WorkReply; error?: string }) => {
      if (!started) {
        started = true;
        if (m.refused !== undefined) return resolveStart({ refused: m.refused });
        const lane: Lane = {
          request: (req) =>
            new Promise((resolve, reject) => {
              const id = next++;
              waiting.set(id, { resolve, reject });
              worker.postMessage({ id, req });
            }),
        };
        return resolveStart({ lane, ready: m.ready! });
      }
      const w = waiting.get(m.id!);
      if (!w) return;
      waiting.delete(m.id!);
      if (m.reply) w.resolve(m.reply);
      else w.reject(new Error(`a sweep thread could not finish its points: ${m.error}`));
    });
  });
}
