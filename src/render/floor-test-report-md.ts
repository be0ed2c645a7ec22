// The floor-test report: the estimate, how it was found, and what it does not cover.

import type { FloorTestEstimate } from '../core/floor-test/floor-test-types.ts';
import { HEIGHT_OVER_NOISE } from '../core/floor-test/estimate-floor-test.ts';
import { escapeBlock, escapeInline as esc, table } from './markdown-escape.ts';

export function floorTestMarkdown(csvName: string, e: FloorTestEstimate, plotFile: string, ignored: readonly string[]): string {
  const fv = e.free_vibration;
  const rows = [
    ['Natural frequency (from the fit)', e.natural_frequency_hz.toFixed(3), 'Hz'],
    ['Damping ratio (from the fit)', e.damping_ratio_fit.toFixed(4), ''],
    ['Damping ratio (logarithmic decrement)', e.damping_ratio_log_decrement.toFixed(4), ''],
    ['Damped frequency (turning-point spacing)', e.damped_frequency_hz.toFixed(3), 'Hz'],
    ['Stiffness k = M (2 pi f_n)^2', e.stiffness_N_per_mm.toFixed(2), 'N/mm'],
    ['Mass dropped', String(e.mass_kg), 'kg'],
    ['Noise (standard deviation)', e.noise_mm.toFixed(3), 'mm'],
    ['Fit residual (root mean square)', e.fit.rms_mm.toFixed(3), 'mm'],
    ['Free vibration', `${fv.start_s.toFixed(3)} to ${fv.end_s.toFixed(3)}`, 's'],
    ['Half-cycles used', String(fv.half_cycles), ''],
  ];
  const blocks = [
    `# Floor drop test: ${esc(csvName)}`,
    table(['Quantity', 'Value', 'Unit'], rows, ['l', 'r', 'l']),
    `![Record and fitted curve](${plotFile})`,
    '## Method',
    [
      '- The free vibration starts at the first peak: the sample farthest from the record\'s starting level. Before it lie the drop and the impact.',
      `- It ends at the last turning point whose half-cycle height (one turning point to the next) is at least ${HEIGHT_OVER_NOISE} times the noise, found from the record's second differences. Turning points are taken with a hysteresis band so noise cannot make one, and refined by a least-squares parabola through the samples around each.`,
      '- Logarithmic decrement: the slope of ln(half-cycle height) against the half-cycle count, which needs no estimate of where the floor settles; zeta = delta / sqrt(4 pi^2 + delta^2).',
      '- Fit: x(t) = A e^(-zeta w_n t) cos(w_d t + phi) + c, w_d = w_n sqrt(1 - zeta^2), by least squares (Levenberg-Marquardt) over the free vibration, started from the decrement. The fit\'s f_n and zeta are the ones reported.',
      '- Stiffness k = M (2 pi f_n)^2 treats the floor\'s own moving mass as nothing beside M, which gives k a little low.',
    ].join('\n'),
    '## Cautions',
    [
      '- The estimate assumes a linear floor about its rest position under M and a mass that stays on the floor (strapped, or dropped from low enough not to bounce). A strap floor stiffens as it sags: test with a mass and drop height near the crew\'s.',
      ...e.notes.map((n) => `- ${escapeBlock(n)}`),
      ...(ignored.length ? [`- Columns not used: ${esc(ignored.join(', '))}.`] : []),
    ].join('\n'),
    '## Using it in a specification',
    `Under floor_straps: \`measured: { damping_ratio: ${e.damping_ratio.toFixed(3)}, stiffness_N_per_mm: ${e.stiffness_N_per_mm.toFixed(1)}, source: "..." }\`, the source naming this test (date, sample, mass, drop height).`,
  ];
  return `${blocks.join('\n\n')}\n`;
}
