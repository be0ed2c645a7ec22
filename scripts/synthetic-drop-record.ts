// A synthetic drop record of our own invention, for the demo and the tests:
// a mass strapped to a linear floor, dropped from a height, so the floor
// starts at rest with the impact velocity; Gaussian noise from a seeded
// generator, so the same seed gives the same record.

export interface SyntheticDrop {
  mass_kg: number;
  natural_frequency_hz: number;
  damping_ratio: number;
  drop_height_mm: number;
  noise_mm: number;
  sample_rate_hz: number;
  duration_s: number;
  /** Quiet time before the impact. */
  lead_s: number;
  seed: number;
}

const G = 9.80665; // standard gravity, m/s^2

/** Floor displacement, positive down, mm: zero before the impact, then the damped response about the static sag. */
export function syntheticDrop(p: SyntheticDrop): { t_s: number[]; x_mm: number[] } {
  const wn = 2 * Math.PI * p.natural_frequency_hz;
  const wd = wn * Math.sqrt(1 - p.damping_ratio ** 2);
  const sag = (G / (wn * wn)) * 1000; // M g / k, mm
  const v0 = Math.sqrt(2 * G * (p.drop_height_mm / 1000)) * 1000; // mm/s
  // x(0) = 0, x'(0) = v0 about the static sag.
  const a = -sag;
  const b = (v0 + p.damping_ratio * wn * a) / wd;
  const random = normal(p.seed);
  const n = Math.round(p.duration_s * p.sample_rate_hz) + 1;
  const t_s: number[] = [];
  const x_mm: number[] = [];
  for (let i = 0; i < n; i++) {
    const t = i / p.sample_rate_hz;
    const tau = t - p.lead_s;
    const clean = tau < 0 ? 0 : sag + Math.exp(-p.damping_ratio * wn * tau) * (a * Math.cos(wd * tau) + b * Math.sin(wd * tau));
    t_s.push(t);
    x_mm.push(clean + p.noise_mm * random());
  }
  return { t_s, x_mm };
}

/** Standard normal numbers: mulberry32 uniform generator, Box-Muller transform. */
export function normal(seed: number): () => number {
  let state = seed >>> 0;
  const uniform = () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let z = state;
    z = Math.imul(z ^ (z >>> 15), z | 1);
    z ^= z + Math.imul(z ^ (z >>> 7), z | 61);
    return ((z ^ (z >>> 14)) >>> 0) / 4294967296;
  };
  return () => {
    const u = 1 - uniform();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * uniform());
  };
}
