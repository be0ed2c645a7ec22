import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { renderWorkbook } from '../src/render/workbook.ts';
import { SEVERITY_COLOURS, toArgb } from '../src/render/severity-palette.ts';
import { sampleResult } from './fixtures/sample-result.ts';
import type { CheckResult } from '../src/core/result/check-result.ts';
import { SHORT_CAUTION } from '../src/core/cautions.ts';
import { SEVERITY_MEANING } from '../src/core/findings/severity.ts';
import { BAR_FIRST_COLUMN } from '../src/render/sheets/stock-plan-sheet.ts';
import { partLabels } from '../src/render/stock-bar.ts';
import { OFFCUT_FILL, partFill } from '../src/render/stock-palette.ts';
import { SEVERITY_MARKS } from '../src/render/severity-palette.ts';
import { readDemo } from './support/fixtures.ts';
import type { DecisiveInput } from '../src/core/decisive/decisive-input.ts';
import { zipEntries } from './workbook/zip-entries.ts';

async function readBack(result: CheckResult): Promise<ExcelJS.Workbook> {
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load((await renderWorkbook(result)) as unknown as ExcelJS.Buffer);
  return wb;
}

function sheet(wb: ExcelJS.Workbook, name: string): ExcelJS.Worksheet {
  const ws = wb.getWorksheet(name);
  if (!ws) throw new Error(`no sheet ${name}`);
  return ws;
}

/** Every cell's text on a sheet, in reading order. */
function texts(ws: ExcelJS.Worksheet): string[] {
  const out: string[] = [];
  ws.eachRow((row) => row.eachCell((cell) => out.push(cell.value === null ? '' : cell.text)));
  return out;
}

function fillOf(cell: ExcelJS.Cell): string | undefined {
  const fill = cell.fill as ExcelJS.FillPattern | undefined;
  return fill?.fgColor?.argb;
}

/** Data rows below the header row of a sheet whose header is on row 2. */
function dataRows(ws: ExcelJS.Worksheet): ExcelJS.Row[] {
  const rows: ExcelJS.Row[] = [];
  ws.eachRow((row) => {
    if (row.number > 2) rows.push(row);
  });
  return rows;
}

describe('renderWorkbook', () => {
  const result = sampleResult();

  it('writes the ten sheets in order', async () => {
    const wb = await readBack(result);
    expect(wb.worksheets.map((ws) => ws.name)).toEqual([
      'Summary', 'Findings', 'Mass and balance', 'Loads', 'Cut list', 'Leather', 'Wheel setting-out', 'Stock plan', 'Spec as checked', 'Sources',
    ]);
  });

  it('lists every load on the Loads sheet', async () => {
    const ws = sheet(await readBack(result), 'Loads');
    const rows = dataRows(ws);
    expect(rows).toHaveLength(result.loads.length);
    expect(rows[0].getCell(5).value).toBe(result.loads[0].value);
    expect(rows[0].getCell(3).value).toBe(result.loads[0].case);
  });

  it('puts the one-line caution at the top of every sheet', async () => {
    const wb = await readBack(result);
    for (const ws of wb.worksheets) {
      expect(ws.getCell('A1').value, ws.name).toBe(SHORT_CAUTION);
    }
  });

  it('shows the verdict, every caution in full and the counts on Summary', async () => {
    const ws = sheet(await readBack(result), 'Summary');
    const all = texts(ws);
    for (const caution of result.cautions) expect(all).toContain(caution);
    expect(all).toContain(result.verdict.toUpperCase());
    let verdictCell: ExcelJS.Cell | undefined;
    const counts: Record<string, unknown> = {};
    ws.eachRow((row) => {
      const label = row.getCell(1).value;
      if (label === 'Verdict') verdictCell = row.getCell(2);
      if (typeof label === 'string' && ['fail', 'warning', 'advice', 'pass'].includes(label)) counts[label] = row.getCell(2).value;
    });
    expect(verdictCell?.value).toBe('FAIL');
    expect(verdictCell?.font?.size).toBeGreaterThanOrEqual(20);
    const expected = Object.fromEntries(
      ['fail', 'warning', 'advice', 'pass'].map((s) => [s, result.findings.filter((f) => f.severity === s).length]),
    );
    expect(counts).toEqual(expected);
    for (const [name, fig] of Object.entries(result.figures)) {
      let found = false;
      ws.eachRow((row) => {
        if (row.getCell(1).value === name) {
          found = true;
          expect(row.getCell(2).value).toBe(fig.value);
          expect(row.getCell(3).value).toBe(fig.unit || null); // an empty cell where the figure has no unit
        }
      });
      expect(found, name).toBe(true);
    }
  });

  it('lists graded findings worst first with their raw values, subject in words and by id, fix, sources and working', async () => {
    const ws = sheet(await readBack(result), 'Findings');
    expect(ws.getRow(2).getCell(1).value).toBe('No.');
    const rows = dataRows(ws).filter((r) => typeof r.getCell(2).value === 'string');
    expect(rows.map((r) => r.getCell(2).value).slice(0, 4)).toEqual(['fail', 'warning', 'advice', 'pass']);

    const warning = result.findings.find((f) => f.severity === 'warning')!;
    const row = rows.find((r) => r.getCell(4).value === warning.code)!;
    expect(row.values).toEqual([
      undefined, // exceljs rows are 1-based
      '2', warning.severity, warning.rule, warning.code, warning.subject_label, warning.value, warning.limit, warning.unit,
      warning.utilisation, warning.message, warning.subject, undefined, warning.fix, warning.sources.join('; '), warning.working_text,
    ]);
    expect(row.getCell(9).numFmt).toBe('0.0%');
    expect(row.getCell(6).numFmt).toBe('0.0'); // newtons to a tenth; the cell keeps every digit
    expect(row.getCell(15).alignment?.wrapText).toBe(true);
  });

  it('says what each severity means beside its count on Summary', async () => {
    const ws = sheet(await readBack(result), 'Summary');
    const meaning = new Map<unknown, unknown>();
    ws.eachRow((row) => meaning.set(row.getCell(1).value, row.getCell(3).value));
    for (const [s, text] of Object.entries(SEVERITY_MEANING)) expect(meaning.get(s), s).toBe(text);
  });

  it('keeps notes apart from the graded findings', async () => {
    const r = sampleResult();
    r.findings.push({ ...r.findings[0], severity: 'info', rule: 'balance.axle-position', subject_label: 'standing, crew as placed', utilisation: null, limit: null });
    const ws = sheet(await readBack(r), 'Findings');
    const values = dataRows(ws).map((x) => [x.getCell(1).value, x.getCell(2).value]);
    const notesAt = values.findIndex(([first]) => typeof first === 'string' && first.startsWith('Notes'));
    expect(values.slice(0, notesAt).map(([, s]) => s).filter(Boolean)).toEqual(['fail', 'warning', 'advice', 'pass']);
    expect(values.slice(notesAt)).toContainEqual(['N1', 'info']);
  });

  it('fills severity cells by severity, writes the word, and puts its mark before it by the number format', async () => {
    const rows = dataRows(sheet(await readBack(result), 'Findings'));
    const graded = rows.filter((r) => ['fail', 'warning', 'advice', 'pass'].includes(r.getCell(2).text));
    expect(new Set(graded.map((r) => r.getCell(2).value))).toEqual(new Set(['fail', 'warning', 'advice', 'pass']));
    for (const r of graded) {
      const cell = r.getCell(2);
      const s = cell.value as keyof typeof SEVERITY_COLOURS;
      expect(fillOf(cell)).toBe(toArgb(SEVERITY_COLOURS[s].fill));
      expect(cell.font?.color?.argb).toBe(toArgb(SEVERITY_COLOURS[s].text));
      expect(cell.numFmt).toBe(`"${SEVERITY_MARKS[s]} "@`);
    }
  });

  it('freezes the header and filters the findings table', async () => {
    const ws = sheet(await readBack(result), 'Findings');
    expect(ws.views[0]).toMatchObject({ state: 'frozen', ySplit: 2 });
    expect(ws.autoFilter).toBeTruthy();
  });

  it('prints the findings through the fix, leaving the sources and working on screen, and says so on each page', async () => {
    const ws = sheet(await readBack(result), 'Findings');
    const headers = (ws.getRow(2).values as unknown[]).slice(1);
    const fix = headers.indexOf('Fix') + 1;
    expect(headers.slice(fix)).toEqual(['Sources', 'Working']);
    const letter = String.fromCharCode(64 + fix);
    expect(ws.pageSetup.printArea).toMatch(new RegExp(`^\\$?A\\$?1:\\$?${letter}\\$?\\d+$`));
    expect(ws.pageSetup.printTitlesRow).toMatch(/^\$?1:\$?2$/);
    expect(ws.headerFooter.oddHeader).toContain('Not printed: sources and working');
  });

  it('tables the parts with totals and the load cases', async () => {
    const ws = sheet(await readBack(result), 'Mass and balance');
    const byLabel = new Map<unknown, ExcelJS.Row>();
    ws.eachRow((row) => byLabel.set(row.getCell(1).value, row));
    for (const p of result.mass.parts) {
      const row = byLabel.get(p.part)!;
      expect(row.getCell(3).value).toBe(p.mass_kg);
      expect(row.getCell(7).value).toBe(p.measured ? 'measured' : 'computed');
    }
    expect(byLabel.get('Total')!.getCell(3).value).toBe(result.mass.total_mass_kg);
    expect(byLabel.get('Total, rolling assembly')!.getCell(3).value).toBe(result.mass.rolling_mass_kg);
    for (const c of result.balance.cases) {
      const row = byLabel.get(c.id)!;
      expect(row.getCell(5).value).toBe(c.pole_load_N);
      expect(row.getCell(7).value).toBe(c.per_horse_N);
      expect(row.getCell(9).value).toBe(c.working);
      expect(row.getCell(5).numFmt).toBe('0.0');
    }
  });

  it('marks defaulted spec entries and sets them apart', async () => {
    const rows = dataRows(sheet(await readBack(result), 'Spec as checked'));
    expect(rows).toHaveLength(result.spec_as_checked.length);
    result.spec_as_checked.forEach((entry, i) => {
      const row = rows[i];
      expect(row.getCell(1).value).toBe(entry.path);
      expect(row.getCell(4).value).toBe(entry.defaulted ? 'default' : null);
      expect(Boolean(row.getCell(1).font?.italic)).toBe(entry.defaulted);
    });
  });

  it('lists every source by id with its citation', async () => {
    const rows = dataRows(sheet(await readBack(result), 'Sources'));
    expect(rows.map((r) => r.getCell(1).value)).toEqual(result.sources.map((s) => s.id));
    rows.forEach((r, i) => expect(r.getCell(2).text).toContain(result.sources[i].citation));
  });

  it('refuses a result without cautions', async () => {
    await expect(renderWorkbook({ ...result, cautions: [] })).rejects.toThrow(/cautions/);
  });
});

describe('renderWorkbook, cutting sheets', () => {
  const result = sampleResult();
  const { cut_list, leather, setting_out, stock_plan } = result.cutting;

  /** The first row whose first cell holds this value. */
  function rowWith(ws: ExcelJS.Worksheet, first: unknown): ExcelJS.Row {
    let found: ExcelJS.Row | undefined;
    ws.eachRow((row) => {
      if (!found && row.getCell(1).value === first) found = row;
    });
    if (!found) throw new Error(`no row starting ${String(first)} on ${ws.name}`);
    return found;
  }

  it('lists every part on the cut list with its sizes as numbers, and totals the rough volume with spares', async () => {
    const ws = sheet(await readBack(result), 'Cut list');
    const spoke = cut_list.find((c) => c.part === 'spoke')!;
    expect(rowWith(ws, 'spoke').values).toEqual([
      undefined,
      spoke.part, spoke.quantity, spoke.spares, spoke.species,
      spoke.finished.length_mm, spoke.finished.width_mm, spoke.finished.thickness_mm,
      spoke.rough.length_mm, spoke.rough.width_mm, spoke.rough.thickness_mm,
      spoke.grain, 'no', spoke.volume_m3, spoke.mass_kg, spoke.basis,
    ]);
    expect(dataRows(ws)).toHaveLength(cut_list.length + 1);
    const total = dataRows(ws).at(-1)!;
    expect(total.getCell(13).value).toBeCloseTo(result.figures.timber_volume.value, 12);
    expect(rowWith(ws, 'pole').getCell(12).value).toBe('yes');
  });

  it('lists the straps, lashings and hides', async () => {
    const ws = sheet(await readBack(result), 'Leather');
    for (const i of leather.items) expect(rowWith(ws, i.item).getCell(7).value).toBe(i.area_m2);
    const hides = rowWith(ws, leather.hides[0].material);
    // The items table lists the material in column 2, the hides table in column 1.
    expect(hides.getCell(5).value).toBe(leather.hides[0].hides);
  });

  it('gives every setting-out dimension with its unit and says where the drawing is', async () => {
    const ws = sheet(await readBack(result), 'Wheel setting-out');
    expect(rowWith(ws, 'Spoke length between shoulders').values).toEqual([undefined, 'Spoke length between shoulders', setting_out.spoke_length_shoulders_mm, 'mm']);
    expect(rowWith(ws, 'Felloe piece chord').getCell(2).value).toBe(setting_out.felloe_chord_mm);
    setting_out.mortise_positions_deg.forEach((deg, i) => expect(rowWith(ws, `Mortise ${i + 1}, from the first`).getCell(2).value).toBe(deg));
    for (const line of setting_out.basis) expect(texts(ws)).toContain(line);
    expect(texts(ws).some((t) => t.includes('wheel-setting-out.svg'))).toBe(true);
  });

  it('tables each group and draws each pattern as a bar of fills, one colour per part and pale grey offcut', async () => {
    const ws = sheet(await readBack(result), 'Stock plan');
    const group = stock_plan.groups[0];
    const groupRow = rowWith(ws, 1);
    expect(groupRow.getCell(2).value).toBe(group.species);
    expect(groupRow.getCell(6).value).toBe(group.plan.pieces_used);
    expect(rowWith(ws, 'All groups').getCell(6).value).toBe(stock_plan.pieces);

    // The scale is printed in the bar header; read it back rather than assume it.
    const head = texts(ws).find((t) => t.startsWith('Bar: one column = '))!;
    const scale = Number(/= (\d+) mm/.exec(head)![1]);
    const pattern = group.plan.patterns.find((p) => new Set(p.cuts.map((c) => c.label)).size > 1)!;
    const id = `1.${group.plan.patterns.indexOf(pattern) + 1}`;
    const row = rowWith(ws, id);
    expect([row.getCell(2).value, row.getCell(3).value, row.getCell(5).value]).toEqual([pattern.stock_length_mm, pattern.count, pattern.offcut_mm]);

    const cells = Math.ceil(pattern.stock_length_mm / scale);
    const fills = Array.from({ length: cells }, (_, i) => fillOf(row.getCell(BAR_FIRST_COLUMN + i)));
    const labels = partLabels(stock_plan);
    // Walk the cuts along the stock: the cell under the middle of each cut has that part's colour.
    let at = 0;
    const kerf = (pattern.stock_length_mm - pattern.offcut_mm - pattern.cuts.reduce((s, c) => s + c.length_mm, 0)) / (pattern.cuts.length - 1);
    for (const c of pattern.cuts) {
      expect(fills[Math.floor((at + c.length_mm / 2) / scale)], c.label).toBe(toArgb(partFill(labels, c.label)));
      at += c.length_mm + kerf;
    }
    expect(fills.at(-1)).toBe(toArgb(OFFCUT_FILL));
    expect(row.getCell(BAR_FIRST_COLUMN).value).toBe(pattern.cuts[0].label);
    expect(row.getCell(BAR_FIRST_COLUMN + cells).fill).toBeUndefined();
    // Distinct parts, distinct colours.
    expect(new Set(fills).size).toBe(new Set(pattern.cuts.map((c) => c.label)).size + 1);
  });

  it('lists the parts that no listed stock serves, with what to buy', async () => {
    const ws = sheet(await readBack(result), 'Stock plan');
    const u = stock_plan.unserved[0];
    const row = rowWith(ws, u.part);
    expect(row.getCell(4).value).toBe(u.reason);
    expect(row.getCell(5).value).toBe(u.buy);
  });
});

describe('renderWorkbook, the sheet it opens on', () => {
  const decisive: DecisiveInput = {
    rule: 'member.pole', subject: 'pole.strut', severity: 'pass', input: 'crew.0.mass_kg', origin: 'spec', value: 78, unit: 'kg',
    status: 'given', break_even: 103, to_severity: 'fail', change: 103 / 78 - 1,
  };
  const result: CheckResult = {
    ...sampleResult(),
    input: readDemo('demo-two-crew'),
    decisive_inputs: [decisive],
    decisive_search: { findings: 1, candidates: 4, reruns: 9, work: 9, work_limit: 400, unsearched: 0 },
  };

  it('opens on the summary: first, the active tab and the only one selected; findings second; the fill-in sheets last', async () => {
    const bytes = await renderWorkbook(result);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(bytes as unknown as ExcelJS.Buffer);
    const names = wb.worksheets.map((ws) => ws.name);
    expect(names.slice(0, 2)).toEqual(['Summary', 'Findings']);
    const cover = names.indexOf('Start here');
    expect(cover).toBeGreaterThan(names.indexOf('Sources'));
    expect(names.slice(cover)).toContain('Axle');
    expect(wb.views[0].activeTab).toBe(0);
    // The library does not read `tabSelected` back: read the sheets' own XML. Sheet files follow the sheets' order.
    const sheetXml = zipEntries(bytes).filter((e) => /^xl\/worksheets\/sheet\d+\.xml$/.test(e.name));
    const selected = sheetXml.filter((e) => /<sheetView[^>]*tabSelected="1"/.test(e.text())).map((e) => e.name);
    expect(selected).toEqual(['xl/worksheets/sheet1.xml']);
  });

  it('shows the three highest utilisations with their load case and combination', async () => {
    const ws = sheet(await readBack(result), 'Summary');
    const rows: unknown[][] = [];
    ws.eachRow((row) => rows.push((row.values as unknown[]).slice(1)));
    const at = rows.findIndex((r) => r[0] === 'Subject' && r[3] === 'Utilisation');
    expect(rows[at]).toEqual(['Subject', 'Severity', 'Rule', 'Utilisation', 'Load case', 'Combination', 'Finding No.']);
    const graded = result.findings.filter((f) => f.severity !== 'info' && f.utilisation !== null);
    const top = [...graded].sort((a, b) => b.utilisation! - a.utilisation!).slice(0, 3);
    const shown = rows.slice(at + 1, at + 4);
    expect(shown.map((r) => r[3])).toEqual(top.map((f) => f.utilisation));
    expect(shown.map((r) => [r[0], r[2], r[4], r[5]])).toEqual(top.map((f) => [f.subject_label, f.rule, f.load_case ?? 'none', f.combination ?? 'none']));
    // The number points at the same finding in the Findings sheet.
    const findings = sheet(await readBack(result), 'Findings');
    for (const r of shown) {
      let match: ExcelJS.Row | undefined;
      findings.eachRow((row) => {
        if (row.getCell(1).value === r[6]) match = row;
      });
      expect(match?.getCell(9).value).toBe(r[3]);
    }
  });

  it('shows the decisive inputs where the check searched for them, and leaves them out where it did not', async () => {
    const all = texts(sheet(await readBack(result), 'Summary'));
    expect(all).toContain('crew.0.mass_kg');
    expect(all).toContain('member.pole (pole.strut)');
    expect(all.some((t) => t.startsWith('What the verdict hangs on'))).toBe(true);
    const without = texts(sheet(await readBack(sampleResult()), 'Summary'));
    expect(without.some((t) => t.startsWith('What the verdict hangs on'))).toBe(false);
  });

  it('marks the verdict with its severity: word, mark, fill and ink', async () => {
    const ws = sheet(await readBack(result), 'Summary');
    let verdict: ExcelJS.Cell | undefined;
    ws.eachRow((row) => {
      if (row.getCell(1).value === 'Verdict') verdict = row.getCell(2);
    });
    const s = result.verdict;
    expect(verdict?.value).toBe(s.toUpperCase());
    expect(verdict?.numFmt).toBe(`"${SEVERITY_MARKS[s]} "@`);
    expect(fillOf(verdict!)).toBe(toArgb(SEVERITY_COLOURS[s].fill));
  });

  it('sets every sheet up to print: A4, one page wide, a print area, repeated header rows, named and numbered pages', async () => {
    const wb = await readBack(result);
    for (const ws of wb.worksheets.filter((w) => w.state !== 'hidden')) {
      const p = ws.pageSetup;
      expect(p.paperSize, ws.name).toBe(9);
      expect([p.fitToPage, p.fitToWidth, p.fitToHeight], ws.name).toEqual([true, 1, 0]);
      expect(p.printArea, ws.name).toMatch(/^\$?A\$?1:\$?[A-Z]+\$?\d+$/);
      expect(p.printTitlesRow, ws.name).toMatch(/^\$?1:\$?\d+$/);
      expect(ws.headerFooter.oddHeader, ws.name).toContain('&A');
      expect(ws.headerFooter.oddHeader, ws.name).toContain(result.spec_name);
      expect(ws.headerFooter.oddFooter, ws.name).toContain('Page &P of &N');
    }
    // Wide sheets turn to landscape; the narrow setting-out stays upright.
    expect(sheet(wb, 'Findings').pageSetup.orientation).toBe('landscape');
    expect(sheet(wb, 'Wheel setting-out').pageSetup.orientation).toBe('portrait');
  });
});
