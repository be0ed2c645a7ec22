// The least value at which a condition holds, for a condition measured by a
// continuous excess g that falls through zero as the value rises (g ≤ 0
// holds): the secant through the two latest trials, kept inside the bracket
// once a sign change is seen (regula falsi on the bracket where the secant
// leaves it), and bisecting the bracket where a step has not halved |g| (a
// safeguard in the manner of Brent's, brent-1973, for a g flat on one side).
// It stops when the next root is close enough to the last trial (see below),
// or the bracket is narrower than the tolerance; every trial is counted.

export interface Trial {
  z: number;
  g: number;
}

export interface SecantLeast {
  /** The root of g, or the bracket's holding end where the bracket closed first; null where g > 0 even at the upper bound, or unsettled. */
  root: number | null;
  /**
   * How it ended: the secant settled on a root (not itself a trial), the
   * bracket closed (the root is its holding end), g held at the lower bound,
   * failed at the upper bound, or the trials ran out first.
   */
  how: 'secant' | 'bracket' | 'lower' | 'upper' | 'unsettled';
  tried: Trial[];
}

export interface SecantOptions {
  lower: number;
  upper: number;
  /** Relative tolerance on the value. */
  tolerance: number;
  /** Trials at most. */
  maxTrials: number;
  /**
   * Values not to step past until g holds somewhere: no trial lies beyond the
   * first of them above the greatest trial where g fails, so that a condition
   * holding only on a band is bracketed from below as a walk up them would.
   */
  walk?: readonly number[];
}

/** The tightest bracket seen: the greatest value where g fails below the least where it holds, or null. */
export function bracketOf(tried: readonly Trial[]): { lo: Trial; hi: Trial } | null {
  const fails = tried.filter((p) => p.g > 0), holds = tried.filter((p) => p.g <= 0);
  if (!fails.length || !holds.length) return null;
  const lo = fails.reduce((m, p) => (p.z > m.z ? p : m)), hi = holds.reduce((m, p) => (p.z < m.z ? p : m));
  return lo.z < hi.z ? { lo, hi } : null;
}

/** The secant's root through two trials; NaN where either measured nothing (g not finite) or g rises with z (the wrong way: no root ahead). */
const through = (a: Trial, b: Trial) => {
  if (!Number.isFinite(a.g) || !Number.isFinite(b.g)) return NaN;
  const slope = (b.g - a.g) / (b.z - a.z);
  return slope < 0 ? b.z - b.g / slope : NaN;
};

/** Starts at `first`, then steps by the caller's estimate from that trial (`stepFrom`, again wherever there is no secant's root), then the secant. */
export function secantLeast(g: (z: number) => number, first: number, stepFrom: (p: Trial) => number, o: SecantOptions): SecantLeast {
  const clamp = (z: number) => {
    const fails = tried.filter((p) => p.g > 0).map((p) => p.z);
    const ceiling = o.walk && fails.length && fails.length === tried.length ? o.walk.find((w) => w > Math.max(...fails)) : undefined;
    return Math.min(ceiling ?? o.upper, o.upper, Math.max(o.lower, z));
  };
  const tried: Trial[] = [];
  const trial = (z: number) => {
    const p = { z, g: g(z) };
    tried.push(p);
    return p;
  };
  const done = (root: number | null, how: SecantLeast['how']): SecantLeast => ({ root, how, tried });
  const p1 = trial(clamp(first));
  let next = clamp(stepFrom(p1));
  while (tried.length < o.maxTrials && !tried.some((p) => p.z === next)) {
    const p = trial(next);
    const br = bracketOf(tried);
    const [a, b] = tried.slice(-2);
    let root = through(a, b);
    if (br && !(root > br.lo.z && root < br.hi.z)) root = through(br.lo, br.hi);
    if (br && br.hi.z - br.lo.z <= o.tolerance * br.hi.z) return done(br.hi.z, 'bracket');
    // Settled: the last step is within a quarter of the tolerance, or within it while the steps shrink so fast (the secant's superlinear order) that the next would be below a sixteenth.
    const step = Math.abs(root - p.z), before = Math.abs(p.z - a.z);
    if (step <= 0.25 * o.tolerance * p.z || (step <= o.tolerance * p.z && (step * step) / before <= o.tolerance * p.z / 16)) return done(clamp(root), 'secant');
    if (root <= o.lower && tried.some((q) => q.z === o.lower && q.g <= 0)) return done(o.lower, 'lower');
    if (root >= o.upper && tried.some((q) => q.z === o.upper && q.g > 0)) return done(null, 'upper');
    // Without a secant's root: halve the bracket, or take the caller's step from the latest trial.
    const blind = !Number.isFinite(root);
    next = br && (blind || Math.abs(p.g) > Math.abs(a.g) / 2) ? 0.5 * (br.lo.z + br.hi.z) : clamp(blind ? stepFrom(p) : root);
  }
  return done(null, 'unsettled');
}
