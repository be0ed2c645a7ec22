// What every chart of ours shares around its layers: the schema, the title,
// the size, a white ground, one font, and the frame's and axes' style.

const AXIS = { labelFontSize: 11, titleFontSize: 11, titleFontWeight: 'normal' } as const;

export function chartFrame(title: string, size: { width: number; height: number }, style: { axis: Record<string, unknown>; legend: Record<string, unknown> }) {
  return {
    $schema: 'https://vega.github.io/schema/vega-lite/v6.json',
    title,
    width: size.width,
    height: size.height,
    background: '#ffffff',
    config: {
      font: 'sans-serif',
      title: { fontSize: 13, anchor: 'start', offset: 8 },
      axis: { ...AXIS, ...style.axis },
      legend: style.legend,
      view: { stroke: '#444444' },
      // No ARIA label per data point: the caption and title say what the plot shows, and the file stays small.
      mark: { aria: false },
    },
  } as const;
}
