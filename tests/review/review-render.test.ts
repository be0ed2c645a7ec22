import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { CAUTIONS, SHORT_CAUTION } from '../../src/core/cautions.ts';
import { uncheckedRow, type ReviewRow } from '../../src/core/review/review-row.ts';
import { reviewTable } from '../../src/core/review/review-table.ts';
import { reviewCsv } from '../../src/render/review/review-csv.ts';
import { reviewHtml } from '../../src/render/review/review-html.ts';
import { reviewWorkbook } from '../../src/render/review/review-workbook.ts';
import { csvRows } from './csv-rows.ts';

// The three files of the review say the same rows, each with the cautions;
// the HTML and the workbook link each report by a relative link that no
// file name can break out of.

const checked: ReviewRow = {
  ...uncheckedRow('a/odd <name>#1.yaml', 'odd <name>#1', 'refused', 'x'),
  status: 'checked',
  error: null,
  build: 'Build "A", two crew',
  verdict: 'warning',
  worst: [
    { rule: 'turn.rollover', severity: 'warning', subject: 'case.turn', subject_label: 'turn at 30 km/h', utilisation: 0.871 },
    { rule: 'floor.sag', severity: 'advice', subject: 'floor', subject_label: 'floor over the pole', utilisation: null },
  ],
  decisive: [{ rule: 'turn.rollover', input: 'crew.0.cg_height_mm', value: 1000, unit: 'mm', break_even: 711, to_severity: 'pass' }],
  cost: 352.94625,
  total_mass_kg: 230.93,
  load_per_horse_n: 94.59,
  axle_load_n: 2075.5,
  report: 'odd <name>#1/report.html',
};
const refused = uncheckedRow('b.yaml', 'b', 'refused', 'box.axle_x_mm (line 3, column 5): must be a number [1001]');
const table = reviewTable({ given: 3, rows: [checked, refused], notChecked: ['c.yaml'], decisiveWorkLimit: 100 });

describe('the review files', () => {
  it('CSV: a header, a row per proposal with raw numbers, then the cautions after an empty line', () => {
    const rows = csvRows(reviewCsv(table));
    expect(rows[0]).toEqual(['File', 'Build', 'Verdict', 'Worst findings', 'Decisive inputs (value, break-even)', 'Stock cost', 'Total mass (kg)', 'Load per horse (N)', 'Axle load (N)', 'Not checked because', 'Report']);
    expect(rows[1]).toEqual([
      'a/odd <name>#1.yaml',
      'Build "A", two crew',
      'warning',
      // 0.871 is 87.1 %.
      'WARNING turn.rollover: turn at 30 km/h, 87.1\u00a0% of its limit\nADVICE floor.sag: floor over the pole',
      'crew.0.cg_height_mm = 1000\u00a0mm, break-even 711\u00a0mm (to pass)',
      '352.94625',
      '230.93',
      '94.59',
      '2075.5',
      '',
      'odd <name>#1/report.html',
    ]);
    expect(rows[2]).toEqual(['b.yaml', '', 'refused', '', '', '', '', '', '', refused.error, '']);
    expect(rows[3]).toEqual(['']);
    expect(rows.slice(4).map((r) => r[0])).toEqual(CAUTIONS.map((c) => `caution: ${c}`));
  });

  it('HTML: the cautions, every text escaped, the report linked relatively with its name encoded, the notes', () => {
    const html = reviewHtml(table);
    for (const c of CAUTIONS) expect(html).toContain(c.replaceAll('"', '&quot;'));
    expect(html).toContain(SHORT_CAUTION);
    expect(html).toContain('<a href="odd%20%3Cname%3E%231/report.html">odd &lt;name&gt;#1/report.html</a>');
    expect(html).not.toContain('<name>');
    expect(html).toContain('Build &quot;A&quot;, two crew');
    expect(html).toContain('<strong class="badge badge-warning">WARNING</strong>');
    expect(html).toContain('held to a work limit of 100');
    expect(html).toContain('not checked: c.yaml');
  });

  it('workbook: the cautions, the same rows, and a link to each report', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await reviewWorkbook(table)) as unknown as ExcelJS.Buffer);
    const ws = wb.getWorksheet('Review')!;
    const values: ExcelJS.CellValue[] = [];
    ws.eachRow((r) => r.eachCell((c) => values.push(c.value)));
    expect(values[0]).toBe(SHORT_CAUTION);
    for (const c of CAUTIONS) expect(values).toContain(c);
    expect(values).toContainEqual({ text: 'odd <name>#1/report.html', hyperlink: 'odd%20%3Cname%3E%231/report.html' });
    expect(values).toContain(refused.error);
    // Numbers stay numbers in the workbook.
    expect(values).toContain(352.94625);
  });

});
