import type { TopLevelSpec } from 'vega-lite';

/** The chart drawn to SVG text (vega-svg.mjs). */
export function vegaLiteSvg(spec: TopLevelSpec): Promise<string>;
