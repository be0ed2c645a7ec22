import type { Severity } from '../findings/finding.ts';
import type { InputRange } from './input-range.ts';

// The nearest value of one input at which a finding changes severity: step
// out from the checked value both ways (the nearest steps first), then halve
// the bracket until it is narrower than half a percent of the value.

export interface Outcome {
  severity: Severity;
}

/** The finding's outcome with the input at v; null where the check cannot run there (the input would be refused). */
export type Probe = (v: number) => Outcome | null;

export type BreakEven = { break_even: number; to_severity: Severity } | { break_even: null; reason: string };

/** Relative steps out from the checked value, nearest first, alternating up and down. */
export const LADDER = [1.1, 0.9, 1.25, 0.75, 1.5, 0.5, 2, 0.3, 3, 0.2, 5, 0.1, 10] as const;

/** The bracket is closed when its width is below this share of its smaller end. */
export const TOLERANCE = 0.005;

export function breakEven(v0: number, s0: Severity, range: InputRange, probe: Probe, rangeText: string): BreakEven {
  const clip = (v: number) => {
    const c = Math.min(range.high, Math.max(range.low, v));
    return range.integer ? Math.round(c) : c;
  };
  const last = { up: v0, down: v0 };
  const ended = { up: false, down: false };
  for (const f of LADDER) {
    const dir = f > 1 === v0 > 0 ? 'up' : 'down';
    if (ended[dir]) continue;
    const v = clip(v0 * f);
    if (v === last[dir]) {
      ended[dir] = true;
      continue;
    }
    const o = probe(v);
    if (o === null) {
      ended[dir] = true;
      continue;
    }
    if (o.severity !== s0) return bisect(last[dir], v, s0, o.severity, range.integer, probe);
    last[dir] = v;
    if (v === range.low || v === range.high) ended[dir] = true;
  }
  return { break_even: null, reason: `no value within ${rangeText} changes the severity` };
}

/** Between a (severity s0) and b (another), the value nearest a that still changes it. */
function bisect(a: number, b: number, s0: Severity, sb: Severity, integer: boolean, probe: Probe): BreakEven {
  let to = sb;
  for (;;) {
    const width = Math.abs(b - a);
    if (integer ? width <= 1 : width <= TOLERANCE * Math.min(Math.abs(a), Math.abs(b))) break;
    const m = integer ? Math.round((a + b) / 2) : (a + b) / 2;
    const o = probe(m);
    // Where the check cannot run, the change is taken to lie beyond: the bracket closes from that side.
    if (o === null || o.severity === s0) a = m;
    else {
      b = m;
      to = o.severity;
    }
  }
  return { break_even: integer ? b : (a + b) / 2, to_severity: to };
}
