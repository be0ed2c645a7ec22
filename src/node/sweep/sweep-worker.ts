// A worker thread of a sweep: builds its checker from the setup it is
// started with, says it is ready (or why the spec is refused), then answers
// each request in turn. Started by sweep-pool.ts; bundled as its own entry
// (scripts/bundle.ts), so the bundle starts it without compiling anything.
import { parentPort, workerData } from 'node:worker_threads';
import { startSweepWork, type SweepSetup, type WorkRequest } from './sweep-work.ts';

const port = parentPort!;
const work = await startSweepWork((workerData as { setup: SweepSetup }).setup);
if (!work.ok) port.postMessage({ refused: work.reason });
else {
  port.postMessage({ ready: work.ready });
  port.on('message', ({ id, req }: { id: number; req: WorkRequest }) => {
    try {
      port.postMessage({ id, reply: work.handle(req) });
    } catch (e) {
      port.postMessage({ id, error: e instanceof Error ? (e.stack ?? e.message) : String(e) });
    }
  });
}
