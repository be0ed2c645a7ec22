// A vega-lite chart drawn to SVG text: compiled to vega, run in a headless
// view (renderer "none": no canvas, text widths estimated) and serialised.
// Nothing is fetched: every chart carries its data inline. Plain JavaScript
// with no project imports, so the plot worker (src/node/plot-worker.mjs) runs
// it as it stands, from the source or beside the bundle.

import * as vega from 'vega';
import { compile } from 'vega-lite';

/** @param {import('vega-lite').TopLevelSpec} spec @returns {Promise<string>} */
export async function vegaLiteSvg(spec) {
  const view = new vega.View(vega.parse(compile(spec).spec), { renderer: 'none' });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
