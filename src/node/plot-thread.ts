import { Worker } from 'node:worker_threads';
import { drawHere, type PlotDrawer } from '../render/report-plots.ts';
import { plotSpec } from '../render/plots/plot-spec.ts';

// The report's plots drawn on a second thread. Started before the check, the
// thread loads vega while the check runs, then draws while this thread builds
// the report and the workbook: on a machine with two cores the plots cost the
// command little of its time. The charts are built here (pure, cheap); only
// vega's work moves.

export interface PlotThread {
  draw: PlotDrawer;
  /** Stops the thread; the drawer must not be used after. */
  close(): Promise<void>;
}

interface Reply {
  id: number;
  svg?: string;
  error?: string;
}

export function startPlotThread(): PlotThread {
  const worker = new Worker(new URL('./plot-worker.mjs', import.meta.url));
  // Never what keeps the process alive.
  worker.unref();
  const waiting = new Map<number, { resolve(svg: string): void; reject(e: Error): void }>();
  let next = 0;
  let failed: Error | undefined;
  const failAll = (e: Error) => {
    failed = e;
    for (const w of waiting.values()) w.reject(e);
    waiting.clear();
  };
  worker.on('message', (r: Reply) => {
    const w = waiting.get(r.id);
    if (!w) return;
    waiting.delete(r.id);
    if (r.svg !== undefined) w.resolve(r.svg);
    else w.reject(new Error(`the plot thread could not draw a plot: ${r.error}`));
  });
  worker.on('error', (e) => failAll(e));
  worker.on('exit', (code) => failAll(new Error(`the plot thread stopped (exit code ${code})`)));
  const drawOne = (spec: unknown) =>
    new Promise<string>((resolve, reject) => {
      if (failed) return reject(failed);
      const id = next++;
      waiting.set(id, { resolve, reject });
      worker.postMessage({ id, spec });
    });
  return {
    draw: async (plots) => {
      try {
        return await Promise.all(plots.map(async ([file, plot]): Promise<[string, string]> => [file, `${await drawOne(plotSpec(plot))}\n`]));
      } catch (e) {
        // A thread that could not start or died is no reason to lose the report: draw here instead.
        if (failed) return drawHere(plots);
        throw e;
      }
    },
    close: async () => {
      await worker.terminate();
    },
  };
}
