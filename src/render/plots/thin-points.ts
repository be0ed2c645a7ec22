// A long series (the ride command's full run, a drop-test record) has far more
// samples than a plot has pixel columns. Keeping each column's lowest and
// highest point, in order, keeps the drawn shape and every peak.

/** At most the first and last point and each column's lowest and highest, in order. */
export function thinPoints(x: readonly number[], y: readonly number[], columns: number): [number, number][] {
  const pts = x.map((v, i) => [v, y[i]] as [number, number]).filter(([a, b]) => Number.isFinite(a) && Number.isFinite(b));
  if (pts.length <= 2 * columns) return pts;
  const lo = pts[0][0];
  const span = pts[pts.length - 1][0] - lo || 1;
  const out: [number, number][] = [];
  let bucket: [number, number][] = [];
  let current = -1;
  const flush = () => {
    if (bucket.length === 0) return;
    const min = bucket.reduce((a, b) => (b[1] < a[1] ? b : a));
    const max = bucket.reduce((a, b) => (b[1] > a[1] ? b : a));
    out.push(...(min === max ? [min] : min[0] <= max[0] ? [min, max] : [max, min]));
    bucket = [];
  };
  for (const p of pts) {
    const c = Math.min(columns - 1, Math.floor(((p[0] - lo) / span) * columns));
    if (c !== current) {
      flush();
      current = c;
    }
    bucket.push(p);
  }
  flush();
  return out;
}
