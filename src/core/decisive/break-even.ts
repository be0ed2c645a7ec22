import type { Severity } from '../findings/finding.ts';
import type { InputRange } from './input-range.ts';

// The nearest value of one input at which a finding changes severity. The
// finding's value over the level it is nearest to guides each next trial
// (a secant while no change is bracketed, regula falsi once one is); the
// severity of each re-run decides, so a poor guess costs a trial, never a
// wrong answer. Where guidance fails, steps go out from the checked value both
// ways, nearest first, and a bracket is halved.

export interface Outcome {
  severity: Severity;
  /** The finding's value over the guiding level, less one (null where there is none): zero where the severity turns. */
  gap: number | null;
}

/** The finding's outcome with the input at v; null where the check cannot run there (the input would be refused). */
export type Probe = (v: number) => Outcome | null;

export type BreakEven = { break_even: number; to_severity: Severity } | { break_even: null; reason: string };

/** Relative steps out from the checked value, nearest first, alternating up and down. */
export const LADDER = [1.1, 0.9, 1.5, 0.5, 2, 0.3, 5, 0.1, 10] as const;

/** The bracket is closed when its width is below this share of its smaller end (so the value ± 1 % straddles the change). */
export const TOLERANCE = 0.015;

/** Trials one search may make to find a bracket, and again to close it. */
export const MAX_TRIALS = 10;

interface Point {
  v: number;
  o: Outcome;
}

export function breakEven(v0: number, at0: Outcome, range: InputRange, probe: Probe, rangeText: string): BreakEven {
  const snap = (v: number) => {
    const c = Math.min(range.high, Math.max(range.low, v));
    return range.integer ? Math.round(c) : c;
  };
  const s0 = at0.severity;
  const known: Point[] = [{ v: v0, o: at0 }];
  const refused = new Set<number>();
  let trials = 0;
  const trial = (v: number): Point | null => {
    if (refused.has(v) || known.some((p) => p.v === v)) return known.find((p) => p.v === v) ?? null;
    trials++;
    const o = probe(v);
    if (o === null) {
      refused.add(v);
      return null;
    }
    const p = { v, o };
    known.push(p);
    return p;
  };

  // 1. Find a bracket: guided guesses first, the ladder where they fail.
  let ladder = 0;
  let bracket: [Point, Point] | null = null;
  while (!bracket && trials < MAX_TRIALS) {
    const guess = secantGuess(known, v0);
    let v = guess !== null ? snap(guess) : NaN;
    if (!Number.isFinite(v) || known.some((p) => p.v === v) || refused.has(v)) {
      if (ladder >= LADDER.length) break;
      v = snap(v0 * LADDER[ladder++]);
      if (known.some((p) => p.v === v) || refused.has(v)) continue;
    }
    trial(v);
    bracket = nearestBracket(known, v0, s0);
  }
  if (!bracket) return { break_even: null, reason: trials >= MAX_TRIALS ? `no change of severity found in ${MAX_TRIALS} trials within ${rangeText}` : `no value within ${rangeText} changes the severity` };

  // 2. Close it: regula falsi on the gap (Illinois), kept a tenth inside the bracket so it always shrinks.
  let [a, b] = bracket;
  trials = 0;
  let side = 0;
  while (trials < MAX_TRIALS) {
    const width = Math.abs(b.v - a.v);
    if (range.integer ? width <= 1 : width <= TOLERANCE * Math.min(Math.abs(a.v), Math.abs(b.v))) break;
    let m = (a.v + b.v) / 2;
    const ga = a.o.gap;
    const gb = b.o.gap;
    if (ga !== null && gb !== null && ga !== gb && Math.sign(ga) !== Math.sign(gb)) {
      const wa = side === -1 ? 0.5 : 1;
      const wb = side === 1 ? 0.5 : 1;
      m = (a.v * gb * wb - b.v * ga * wa) / (gb * wb - ga * wa);
    }
    const lo = Math.min(a.v, b.v) + 0.1 * width;
    const hi = Math.max(a.v, b.v) - 0.1 * width;
    m = Math.min(hi, Math.max(lo, m));
    if (range.integer) m = Math.round(m);
    if (m === a.v || m === b.v) m = range.integer ? a.v + Math.sign(b.v - a.v) : (a.v + b.v) / 2;
    const p = trial(m);
    // Where the check cannot run, the change is taken to lie beyond: the bracket closes from that side.
    if (p === null || p.o.severity === s0) {
      a = p ?? { v: m, o: a.o };
      side = side === -1 ? 0 : -1;
    } else {
      b = p;
      side = side === 1 ? 0 : 1;
    }
  }
  const done = range.integer ? Math.abs(b.v - a.v) <= 1 : Math.abs(b.v - a.v) <= TOLERANCE * Math.min(Math.abs(a.v), Math.abs(b.v));
  if (!done) return { break_even: null, reason: `the change lies between ${a.v} and ${b.v}; not narrowed within ${MAX_TRIALS} trials` };
  return { break_even: range.integer ? b.v : (a.v + b.v) / 2, to_severity: b.o.severity };
}

/** Where the gap would close, from the two known points with the smallest gaps (a secant), or null. */
function secantGuess(known: readonly Point[], v0: number): number | null {
  const withGap = known.filter((p) => p.o.gap !== null).sort((x, y) => Math.abs(x.o.gap!) - Math.abs(y.o.gap!));
  if (withGap.length < 2) return null;
  const [p, q] = withGap;
  const dg = q.o.gap! - p.o.gap!;
  if (dg === 0 || q.v === p.v) return null;
  const v = p.v - (p.o.gap! * (q.v - p.v)) / dg;
  // A guess a little beyond the predicted change, so that it brackets it; never more than ten times as far as v0.
  const overshoot = v + (v - v0) * 0.01;
  return Number.isFinite(overshoot) && Math.abs(overshoot - v0) <= 10 * Math.abs(v0) ? overshoot : null;
}

/** The closest pair on one side of v0 where the severity is s0 at one end and not at the other. */
function nearestBracket(known: readonly Point[], v0: number, s0: Severity): [Point, Point] | null {
  let best: [Point, Point] | null = null;
  for (const dir of [1, -1]) {
    const side = known.filter((p) => (p.v - v0) * dir >= 0).sort((x, y) => (x.v - y.v) * dir);
    const first = side.findIndex((p) => p.o.severity !== s0);
    if (first <= 0) continue;
    const pair: [Point, Point] = [side[first - 1], side[first]];
    if (!best || Math.abs(pair[1].v - v0) < Math.abs(best[1].v - v0)) best = pair;
  }
  return best;
}
