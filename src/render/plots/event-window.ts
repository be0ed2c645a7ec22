// The part of a run worth plotting: from a little before anything first
// changes to where every channel has settled, so an event of a fifth of a
// second is not a sliver at the left of a three-second axis. A channel has
// settled once it stays within a fraction of its largest excursion from its
// settled value (the mean of the run's last tenth). Nothing is dropped that
// the window should show: the fall of a drop test starts at once, so its
// window starts at the start.

/** A channel has settled within this fraction of its largest excursion. */
export const SETTLED_FRACTION = 0.1;
/** Room before the first change and after the settling, as a fraction of the span between them. */
const LEAD = 0.1;
/** A channel has changed once it has moved this fraction of its largest excursion from its first value. */
const CHANGED_FRACTION = 0.01;

export interface TimeWindow {
  from: number;
  to: number;
}

export function eventWindow(t: readonly number[], channels: readonly (readonly number[])[]): TimeWindow {
  const n = t.length;
  if (n < 2) return { from: t[0] ?? 0, to: t[0] ?? 0 };
  const tail = Math.max(1, Math.floor(n / 10));
  let first = n - 1;
  let last = 0;
  for (const v of channels) {
    const rest = v.slice(n - tail).reduce((a, b) => a + b, 0) / tail;
    const peak = v.reduce((m, x) => Math.max(m, Math.abs(x - rest)), 0);
    if (!(peak > 0)) continue;
    const changed = v.findIndex((x) => Math.abs(x - v[0]) > CHANGED_FRACTION * peak);
    if (changed >= 0) first = Math.min(first, changed);
    for (let i = n - 1; i > last; i--) {
      if (Math.abs(v[i] - rest) > SETTLED_FRACTION * peak) {
        last = i;
        break;
      }
    }
  }
  if (first >= last) return { from: t[0], to: t[n - 1] };
  // The sample before the first change is the last one at rest.
  const start = t[Math.max(0, first - 1)];
  const end = t[Math.min(n - 1, last + 1)];
  const room = LEAD * (end - start);
  return { from: Math.max(t[0], start - room), to: Math.min(t[n - 1], end + room) };
}

/** Indices [i, j) of the samples inside the window. */
export function sampleRange(t: readonly number[], w: TimeWindow): [number, number] {
  const i = t.findIndex((x) => x >= w.from);
  const j = t.findLastIndex((x) => x <= w.to);
  return i < 0 || j < i ? [0, t.length] : [i, j + 1];
}
