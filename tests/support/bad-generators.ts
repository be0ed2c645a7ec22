// Inputs of the bad-input catalogue that are too big, repetitive or binary to
// keep as files: each builds its content when the case runs.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';
import { dropCsv, syntheticRelease, type SyntheticRelease } from '../../scripts/synthetic-drop-record.ts';
import { REPO } from './run-cli.ts';

/** A floor sample pulled 10 mm off rest at 0.1 s, held, let go at 0.5 s: f_n 6 Hz, damping ratio 0.08. */
const PLUCK: SyntheticRelease = { held_mm: 10, natural_frequency_hz: 6, damping_ratio: 0.08, noise_mm: 0.05, pull_s: 0.1, release_s: 0.5, seed: 11 };
export const GENERATORS: Record<string, () => string | Uint8Array | Promise<string | Uint8Array>> = {
  /** A YAML document whose name is a string of 100,000 characters. */
  'long-name': () => `spec_version: 1\nname: ${'x'.repeat(100_000)}\n`,
  // Numbers that are not numbers, solvers that do not stop (issue 15).
  /** A floor-test record of a floor held 10 mm down and let go. */
  'pluck-down-record': () => dropCsv(syntheticRelease(PLUCK)),
  /** The same, held 10 mm up. */
  'pluck-up-record': () => dropCsv(syntheticRelease({ ...PLUCK, held_mm: -10 })),
  /** A floor-test record that is a square wave of ±5 mm, period 0.2 s: no free vibration. */
  'square-wave-record': () => dropCsv({ t_s: Array.from({ length: 2000 }, (_, i) => i / 1000), x_mm: Array.from({ length: 2000 }, (_, i) => (Math.floor(i / 100) % 2 ? 5 : -5)) }),
  /** A stock instance with 5000 priced lengths. */
  'stock-5000-lengths': () => JSON.stringify({ kerf_mm: 3, stock: Array.from({ length: 5000 }, (_, i) => ({ length_mm: 1000 + i, cost: 10 + i / 100 })), pieces: [{ length_mm: 900, quantity: 5 }, { length_mm: 450, quantity: 7 }] }),
  /** The demo with 41 small extra parts of white ash, 1 to 301 of each. */
  'demo-41-pegs': () => {
    const spec = parse(readFileSync(join(REPO, 'specs', 'demo-two-crew.yaml'), 'utf8')) as { stock: Record<string, unknown> };
    spec.stock.extra_parts = Array.from({ length: 41 }, (_, i) => ({ name: `peg ${i + 1}`, species: 'white-ash', length_mm: 10 + i, width_mm: 5, thickness_mm: 5, quantity: 1 + (i % 7) * 50 }));
    return stringify(spec);
  },
};
