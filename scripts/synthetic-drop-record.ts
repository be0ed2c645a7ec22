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

/** A floor held off its rest level and let go (a pluck), sampled at 1 kHz for 2.5 s. */
export interface SyntheticRelease {
  /** Held displacement from rest, mm (either sign). */
  held_mm: number;
  natural_frequency_hz: number;
  damping_ratio: number;
  noise_mm: number;
  /** When the floor is pulled to the held level, and when it is let go, s. */
  pull_s: number;
  release_s: number;
  seed: number;
}

/**
 * At rest (zero) until pulled, held, then the free vibration from rest at
 * x0 (zero velocity) of a linear single-degree system, the closed form of any
 * vibrations textbook:
 * x(tau) = x0 e^(-zeta w tau) (cos w_d tau + zeta / sqrt(1 - zeta^2) sin w_d tau).
 */
export function syntheticRelease(p: SyntheticRelease): { t_s: number[]; x_mm: number[] } {
  const w = 2 * Math.PI * p.natural_frequency_hz;
  const root = Math.sqrt(1 - p.damping_ratio ** 2);
  const random = normal(p.seed);
  const t_s: number[] = [];
  const x_mm: number[] = [];
  for (let i = 0; i <= 2500; i++) {
    const t = i / 1000;
    const tau = t - p.release_s;
    const free = () => p.held_mm * Math.exp(-p.damping_ratio * w * tau) * (Math.cos(w * root * tau) + (p.damping_ratio / root) * Math.sin(w * root * tau));
    const clean = t < p.pull_s ? 0 : tau < 0 ? p.held_mm : free();
    t_s.push(t);
    x_mm.push(clean + p.noise_mm * random());
  }
  return { t_s, x_mm };
}

/** A record as the floor-test CSV holds it: a header, then sample, time and displacement. */
export function dropCsv(record: { t_s: number[]; x_mm: number[] }, comments: string[] = []): string {
  const rows = record.t_s.map((t, i) => `${i},${t.toFixed(4)},${record.x_mm[i].toFixed(4)}`);
  return [...comments.map((c) => `# ${c}`), 'sample,time_s,displacement_mm', ...rows].join('\n') + '\n';
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
