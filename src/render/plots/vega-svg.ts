// A vega-lite chart drawn to SVG text in Node: compiled to vega, run in a
// headless view (renderer "none": no canvas, text widths estimated) and
// serialised. Nothing is fetched: every chart carries its data inline.

import * as vega from 'vega';
import { compile, type TopLevelSpec } from 'vega-lite';

export async function vegaLiteSvg(spec: TopLevelSpec): Promise<string> {
  const view = new vega.View(vega.parse(compile(spec).spec), { renderer: 'none' });
  try {
    return await view.toSVG();
  } finally {
    view.finalize();
  }
}
