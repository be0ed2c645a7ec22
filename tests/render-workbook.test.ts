import { describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { renderWorkbook } from '../io/render/workbook.ts';
import { SEVERITY_COLOURS, toArgb } from '../io/render/severity-palette.ts';
import { sampleResult } from './fixtures/sample-result.ts';
import type { CheckResult } from '../src/result/check-result.ts';
import { SHORT_CAUTION } from '../src/cautions.ts';

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
  ws.eachRow((row) => row.eachCell((cell) => out.push(String(cell.value))));
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

  it('writes the six sheets in order', async () => {
    const wb = await readBack(result);
    expect(wb.worksheets.map((ws) => ws.name)).toEqual([
      'Summary', 'Findings', 'Mass and balance', 'Loads', 'Spec as checked', 'Sources',
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
          expect(row.getCell(3).value).toBe(fig.unit);
        }
      });
      expect(found, name).toBe(true);
    }
  });

  it('lists findings worst first with their values', async () => {
    const ws = sheet(await readBack(result), 'Findings');
    expect(ws.getRow(2).getCell(1).value).toBe('Rule');
    const rows = dataRows(ws);
    expect(rows.map((r) => r.getCell(3).value)).toEqual(['fail', 'warning', 'advice', 'pass']);

    const warning = result.findings.find((f) => f.severity === 'warning')!;
    const row = rows.find((r) => r.getCell(2).value === warning.code)!;
    expect(row.values).toEqual([
      undefined, // exceljs rows are 1-based
      warning.rule, warning.code, warning.severity, warning.subject, warning.value, warning.unit,
      warning.limit, warning.utilisation, warning.message, warning.fix, warning.source, warning.working,
    ]);
    expect(row.getCell(8).numFmt).toBe('0.0%');
    expect(row.getCell(12).alignment?.wrapText).toBe(true);
  });

  it('fills severity cells by severity, fail red', async () => {
    const rows = dataRows(sheet(await readBack(result), 'Findings'));
    const fail = rows.find((r) => r.getCell(3).value === 'fail')!;
    expect(fillOf(fail.getCell(3))).toBe(toArgb(SEVERITY_COLOURS.fail.fill));
    const fills = new Set(rows.map((r) => fillOf(r.getCell(3))));
    expect(fills.size).toBe(4);
  });

  it('freezes the header and filters the findings table', async () => {
    const ws = sheet(await readBack(result), 'Findings');
    expect(ws.views[0]).toMatchObject({ state: 'frozen', ySplit: 2 });
    expect(ws.autoFilter).toBeTruthy();
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

  it('numbers every source', async () => {
    const rows = dataRows(sheet(await readBack(result), 'Sources'));
    expect(rows.map((r) => [r.getCell(1).value, r.getCell(2).value])).toEqual(
      result.sources.map((s, i) => [i + 1, s]),
    );
  });

  it('refuses a result without cautions', async () => {
    await expect(renderWorkbook({ ...result, cautions: [] })).rejects.toThrow(/cautions/);
  });
});
