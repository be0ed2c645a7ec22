import type { WheelRingSpec } from './wheel-ring-spec.ts';

// Values computed from a wheel's ring, kept by what they read (the ring, its
// joints, whether they are hinged, and anything else the caller names), so a
// re-run that leaves the wheel alone (a decisive-input trial, a sweep point, a
// workbench edit) takes them again. The most recently used are kept, up to a
// number each memo sets; kept values must never be changed by their users.

/** One memo of values by ring: its entries, most recently used last, and how many it keeps. */
export interface RingMemo<T> {
  readonly entries: Map<string, T>;
  readonly most: number;
}

const memos: RingMemo<unknown>[] = [];

export function ringMemo<T>(most: number): RingMemo<T> {
  const memo: RingMemo<T> = { entries: new Map(), most };
  memos.push(memo);
  return memo;
}

/** Lets every kept value of every ring memo go (pipeline/kept-values.ts). */
export function forgetRingValues(): void {
  for (const m of memos) m.entries.clear();
}

/** The value kept for this ring (and `extra`), made the first time it is asked for. */
export function keptByRing<T>(memo: RingMemo<T>, ws: WheelRingSpec, extra: unknown, make: () => T): T {
  // Numbers as their own text, so NaN and Infinity keep keys of their own.
  const key = JSON.stringify([ws.ring, ws.joints.angles, ws.joints.representatives, ws.hinged, extra], (_, v: unknown) => (typeof v === 'number' ? String(v) : v));
  let got = memo.entries.get(key);
  if (got === undefined) got = make();
  // Last used last: the first is the one to let go.
  memo.entries.delete(key);
  memo.entries.set(key, got);
  if (memo.entries.size > memo.most) memo.entries.delete(memo.entries.keys().next().value!);
  return got;
}
