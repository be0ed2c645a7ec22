// The floor-test report: the estimate, how it was found, and what it does not
// cover; built as a report document and written as Markdown.

import { formatNumber } from '../core/format/number-format.ts';
import type { FloorTestEstimate } from '../core/floor-test/floor-test-types.ts';
import { HEIGHT_OVER_NOISE } from '../core/floor-test/estimate-floor-test.ts';
import type { ReportDocument, Section, TableBlock } from './model/document.ts';
import { left, numberCell, right, row, textCell } from './model/cells.ts';
import { code, paragraph, plain } from './model/runs.ts';
import { renderMarkdown } from './markdown/render-markdown.ts';

function estimateTable(e: FloorTestEstimate): TableBlock {
  const fv = e.free_vibration;
  const rows: [string, number, string][] = [
    ['Natural frequency (from the fit)', e.natural_frequency_hz, 'Hz'],
    ['Damping ratio (from the fit)', e.damping_ratio_fit, ''],
    ['Damping ratio (logarithmic decrement)', e.damping_ratio_log_decrement, ''],
    ['Damped frequency (turning-point spacing)', e.damped_frequency_hz, 'Hz'],
    ['Stiffness k = M (2 pi f_n)^2', e.stiffness_N_per_mm, 'N/mm'],
    ['Mass dropped', e.mass_kg, 'kg'],
    ['Noise (standard deviation)', e.noise_mm, 'mm'],
    ['Fit residual (root mean square)', e.fit.rms_mm, 'mm'],
    ['Free vibration, start', fv.start_s, 's'],
    ['Free vibration, end', fv.end_s, 's'],
    ['Half-cycles used', fv.half_cycles, 'count'],
  ];
  return {
    kind: 'table',
    id: 'floor-test',
    columns: [left('Quantity'), right('Value', { bare: true }), left('Unit')],
    rows: rows.map(([label, value, unit]) => row([textCell(label), numberCell(value, unit), textCell(unit === 'count' ? '' : unit)])),
    empty: '',
  };
}

const list = (items: string[]) => ({ kind: 'list' as const, items: items.map((t) => [plain(t)]) });
const section = (id: string, title: string, blocks: Section['blocks']): Section => ({ id, title, newPage: false, blocks });

export function floorTestDocument(csvName: string, e: FloorTestEstimate, plotFile: string, ignored: readonly string[]): ReportDocument {
  const measured = `measured: { damping_ratio: ${formatNumber(e.damping_ratio)}, stiffness_N_per_mm: ${formatNumber(e.stiffness_N_per_mm)}, source: "..." }`;
  return {
    title: `Floor drop test: ${csvName}`,
    sections: [
      section('estimate', '', [estimateTable(e), { kind: 'figure', id: 'floor-test', role: 'plot', title: 'Record and fitted curve', caption: '', file: plotFile }]),
      section('method', 'Method', [
        list([
          "The free vibration starts at the first peak: the sample farthest from the record's starting level. Before it lie the drop and the impact.",
          `It ends at the last turning point whose half-cycle height (one turning point to the next) is at least ${formatNumber(HEIGHT_OVER_NOISE)} times the noise, found from the record's second differences. Turning points are taken with a hysteresis band so noise cannot make one, and refined by a least-squares parabola through the samples around each.`,
          'Logarithmic decrement: the slope of ln(half-cycle height) against the half-cycle count, which needs no estimate of where the floor settles; zeta = delta / sqrt(4 pi^2 + delta^2).',
          "Fit: x(t) = A e^(-zeta w_n t) cos(w_d t + phi) + c, w_d = w_n sqrt(1 - zeta^2), by least squares (Levenberg-Marquardt) over the free vibration, started from the decrement. The fit's f_n and zeta are the ones reported.",
          "Stiffness k = M (2 pi f_n)^2 treats the floor's own moving mass as nothing beside M, which gives k a little low.",
        ]),
      ]),
      section('cautions', 'Cautions', [
        list([
          "The estimate assumes a linear floor about its rest position under M and a mass that stays on the floor (strapped, or dropped from low enough not to bounce). A strap floor stiffens as it sags: test with a mass and drop height near the crew's.",
          ...e.notes,
          ...(ignored.length ? [`Columns not used: ${ignored.join(', ')}.`] : []),
        ]),
      ]),
      section('use', 'Using it in a specification', [paragraph('Under floor_straps: ', code(measured), ', the source naming this test (date, sample, mass, drop height).')]),
    ],
  };
}

export function floorTestMarkdown(csvName: string, e: FloorTestEstimate, plotFile: string, ignored: readonly string[]): string {
  return renderMarkdown(floorTestDocument(csvName, e, plotFile, ignored));
}
