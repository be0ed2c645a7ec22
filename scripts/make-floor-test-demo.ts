// Writes specs/floor-test-demo.csv, a synthetic drop record of our own
// invention (not a measurement): `npx tsx scripts/make-floor-test-demo.ts`.
// The record says so in its comment lines, with the numbers it was made from.

import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { dropCsv, syntheticDrop, type SyntheticDrop } from './synthetic-drop-record.ts';

/** Invented demo numbers: a 40 kg mass strapped to a floor sample of 60 N/mm, dropped 20 mm. */
export const FLOOR_TEST_DEMO: SyntheticDrop = {
  mass_kg: 40,
  natural_frequency_hz: Math.sqrt(60_000 / 40) / (2 * Math.PI),
  damping_ratio: 0.08,
  drop_height_mm: 20,
  noise_mm: 0.15,
  sample_rate_hz: 1000,
  duration_s: 2.5,
  lead_s: 0.1,
  seed: 20240605,
};

const p = FLOOR_TEST_DEMO;
const { t_s, x_mm } = syntheticDrop(p);
const text = dropCsv({ t_s, x_mm }, [
  'SYNTHETIC demo record of our own invention, made by scripts/make-floor-test-demo.ts; not a measurement.',
  `Linear floor: f_n ${p.natural_frequency_hz.toFixed(4)} Hz (60 N/mm under ${p.mass_kg} kg), damping ratio ${p.damping_ratio}, drop ${p.drop_height_mm} mm, noise ${p.noise_mm} mm, seed ${p.seed}.`,
  'Run: npx axletree floor-test specs/floor-test-demo.csv --mass-kg 40',
]);
const out = fileURLToPath(new URL('../specs/floor-test-demo.csv', import.meta.url));
writeFileSync(out, text);
console.log(`wrote ${out} (${t_s.length} samples)`);
