import { once } from 'node:events';
import { Worker } from 'node:worker_threads';
import type { ProposalDone, ProposalJob, ProposalSettings } from './proposal-job.ts';
import type { ThreadReply, ThreadRequest } from './thread-messages.ts';
import { checkWorkerUrl } from './worker-place.mjs';

// A thread that checks proposals one at a time (check-worker.ts). A thread
// that dies fails the proposal in hand, and every one after it, with the
// reason; the batch starts another thread for the next proposal.

export interface CheckThread {
  check(job: ProposalJob): Promise<ProposalDone>;
  /** True once the thread died: start another. */
  readonly dead: boolean;
  /** Lets the thread close what it opened (a printer), then stops it. */
  close(): Promise<void>;
}

/** How long a closing thread may take to close its printer before it is stopped. */
const CLOSE_MS = 5000;

export function startCheckThread(settings: ProposalSettings): CheckThread {
  const worker = new Worker(checkWorkerUrl());
  let next = 0;
  let dead: Error | undefined;
  const waiting = new Map<number, { resolve(d: ProposalDone): void; reject(e: Error): void }>();
  const die = (e: Error) => {
    dead ??= e;
    for (const w of waiting.values()) w.reject(dead);
    waiting.clear();
  };
  worker.on('message', (r: ThreadReply) => {
    const w = waiting.get(r.id);
    waiting.delete(r.id);
    if ('done' in r) w?.resolve(r.done);
    else w?.reject(new Error(r.fault));
  });
  worker.on('error', die);
  worker.on('exit', (code) => die(new Error(`the check thread stopped (exit code ${code})`)));
  const send = (m: ThreadRequest) => worker.postMessage(m);
  return {
    get dead() {
      return dead !== undefined;
    },
    check: (job) =>
      new Promise<ProposalDone>((resolve, reject) => {
        if (dead) return reject(dead);
        const id = next++;
        waiting.set(id, { resolve, reject });
        send({ kind: 'check', id, job, settings });
      }),
    close: async () => {
      if (dead) return;
      const exited = once(worker, 'exit');
      send({ kind: 'close' });
      const timer = setTimeout(() => void worker.terminate(), CLOSE_MS);
      await exited.catch(() => undefined);
      clearTimeout(timer);
    },
  };
}
