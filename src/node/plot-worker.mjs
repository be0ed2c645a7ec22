// The plot worker's thread: draws vega-lite charts to SVG as they arrive.
// Plain JavaScript, run as it stands from the source or beside the bundle;
// src/node/plot-thread.ts starts it and hands it the charts.
import { parentPort } from 'node:worker_threads';
import { vegaLiteSvg } from '../render/plots/vega-svg.mjs';

parentPort.on('message', async ({ id, spec }) => {
  try {
    parentPort.postMessage({ id, svg: await vegaLiteSvg(spec) });
  } catch (e) {
    parentPort.postMessage({ id, error: e instanceof Error ? (e.stack ?? e.message) : String(e) });
  }
});
