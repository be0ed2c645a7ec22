// report.md, report.html and the workbook are written from one report model:
// every table shows the same rows and the same numbers in all three. Markdown
// and HTML write each number through the one formatter; the workbook keeps the
// raw number, which that formatter turns into the same text.
import { beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { formatPercent, formatQuantity } from '../src/core/format/number-format.ts';
import type { CheckResult } from '../src/core/result/check-result.ts';
import type { TableBlock } from '../src/render/model/document.ts';
import { reportDocument } from '../src/render/model/report-document.ts';
import { tablesOf } from '../src/render/model/find-table.ts';
import { cellText } from '../src/render/model/cell-text.ts';
import { renderMarkdown } from '../src/render/markdown/render-markdown.ts';
import { renderHtml } from '../src/render/html/render-html.ts';
import { renderWorkbook } from '../src/render/workbook.ts';
import { sheetCells, sheetHeaders } from '../src/render/sheets/sheet-table.ts';
import { readDemo, rulesData } from './support/fixtures.ts';
import { findingsWorstFirst } from '../src/render/severity-order.ts';
import { NO_PLOTS } from './support/report-outputs.ts';

/** Whitespace as a reader sees it: Markdown joins lines, HTML keeps them. */
const norm = (text: string) => text.replace(/\s+/g, ' ').trim();

/** Every Markdown table's body rows, cells unescaped and unbolded. */
function markdownTables(md: string): string[][][] {
  const tables: string[][][] = [];
  let current: string[][] | null = null;
  for (const line of md.split('\n')) {
    if (!line.startsWith('|')) {
      current = null;
      continue;
    }
    if (!current) {
      tables.push((current = []));
      continue; // the header
    }
    if (/^\| -+:? \|/.test(line)) continue; // the alignment row
    const cells = line.slice(2, -2).split(/ (?<!\\)\| /);
    current.push(cells.map((c) => norm(c.trim().replace(/^\*\*?([\s\S]*?)\*\*?$/, '$1').replace(/\\(.)/g, '$1'))));
  }
  return tables;
}

const unescapeHtml = (t: string) => t.replace(/&lt;/g, '<').replace(/&gt;/g, '>').replace(/&quot;/g, '"').replace(/&amp;/g, '&');

/** Every HTML table's body rows by the table's class, cells as plain text. */
function htmlTables(html: string): Map<string, string[][]> {
  const out = new Map<string, string[][]>();
  for (const [, id, body] of html.matchAll(/<table class="([^"]+)">([\s\S]*?)<\/table>/g)) {
    const tbody = body.slice(body.indexOf('<tbody>'));
    // A group's title row (a rule family's) holds a header cell and no data.
    const rows = [...tbody.matchAll(/<tr(?! class="group")[^>]*>([\s\S]*?)<\/tr>/g)].map(([, tr]) => [...tr.matchAll(/<td[^>]*>([\s\S]*?)<\/td>/g)].map(([, td]) => norm(unescapeHtml(td.replace(/<[^>]+>/g, '')))));
    out.set(id, rows);
  }
  return out;
}

/** The model's own text of a table's shown cells. */
function modelText(t: TableBlock): string[][] {
  return t.rows.map((r) => t.columns.flatMap((c, i) => (c.only === 'sheet' ? [] : [norm(cellText(r.cells[i], c))])));
}

/** A table's body rows on a sheet, under the first header row of its columns after row `from` (0-based). */
function sheetRows(ws: ExcelJS.Worksheet, t: TableBlock, from = 0): { rows: unknown[][]; end: number } {
  const header = sheetHeaders(t);
  const rows: unknown[][] = [];
  ws.eachRow({ includeEmpty: true }, (row) => rows.push(Array.from(header, (_h, k) => (row.values as unknown[])[k + 1])));
  const at = rows.findIndex((r, i) => i >= from && header.every((h, k) => r[k] === h));
  expect(at, `${ws.name}: header of ${t.id}`).toBeGreaterThan(0);
  return { rows: rows.slice(at + 1, at + 1 + t.rows.length), end: at + 1 + t.rows.length };
}

// Which sheet holds which of the model's tables (the stock plan sheet merges its fields across bar columns; it is tested on its own).
const SHEETS: Record<string, string[]> = {
  Summary: ['severities', 'figures'],
  Findings: ['findings', 'notes'],
  'Mass and balance': ['parts', 'load-cases'],
  Loads: ['loads'],
  Ride: ['ride-damping', ...['rough-ridge', 'rough-one-wheel', 'stone-ridge', 'stone-one-wheel', 'drop'].flatMap((c) => ['crew', 'wheels', 'case'].map((t) => `ride-${c}-${t}`))],
  'Cut list': ['cut-list'],
  Leather: ['leather-items', 'hides'],
  'Wheel setting-out': ['setting-out'],
  'Spec as checked': ['spec'],
  Sources: ['sources'],
};

describe('one report model, three outputs', () => {
  let result: CheckResult;
  let tables: TableBlock[];
  let md: string;
  let html: string;
  let wb: ExcelJS.Workbook;

  beforeAll(async () => {
    const p = prepareSpec(readDemo('demo-two-crew'), rulesData);
    if (!p.ok) throw new Error('demo does not prepare');
    result = runCheck(p.spec, p.entries, rulesData);
    const doc = reportDocument(result);
    tables = tablesOf(doc);
    md = renderMarkdown(doc);
    html = renderHtml(doc, NO_PLOTS);
    wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await renderWorkbook(result, doc)) as unknown as ExcelJS.Buffer);
  }, 60_000);

  it('Markdown and HTML show every table of the model (but those only the workbook shows), row for row and cell for cell', () => {
    const shown = tables.filter((t) => t.rows.length > 0 && t.only !== 'sheet');
    const mdTables = markdownTables(md);
    expect(mdTables).toHaveLength(shown.length);
    const byId = htmlTables(html);
    shown.forEach((t, k) => {
      const want = modelText(t);
      expect(mdTables[k], `Markdown ${t.id}`).toEqual(want);
      expect(byId.get(t.id), `HTML ${t.id}`).toEqual(want);
    });
  });

  it('the workbook holds the same rows, every number raw', () => {
    for (const [name, ids] of Object.entries(SHEETS)) {
      const ws = wb.getWorksheet(name)!;
      expect(ws, name).toBeDefined();
      let from = 0;
      for (const id of ids) {
        const t = tables.find((x) => x.id === id)!;
        expect(t, id).toBeDefined();
        const got = sheetRows(ws, t, from);
        t.rows.forEach((r, k) => expect(got.rows[k], `${name} ${id} row ${k + 1}`).toEqual(sheetCells(t, r).map((c) => c.value ?? undefined)));
        from = got.end;
      }
    }
  });

  it('every graded finding reads the same in all three, under the same number: its severity, subject, value, limit and utilisation', () => {
    const graded = result.findings.filter((f) => f.severity !== 'info');
    // The reports group the findings by rule family; the workbook lists them worst first: the number ties a row to its finding.
    const mdRows = markdownTables(md)[tables.filter((t) => t.rows.length > 0 && t.only !== 'sheet').findIndex((t) => t.id === 'findings-by-family')];
    const htmlRows = htmlTables(html).get('findings-by-family')!;
    const sheet = sheetRows(wb.getWorksheet('Findings')!, tables.find((t) => t.id === 'findings')!).rows;
    expect(mdRows).toHaveLength(graded.length);
    expect(htmlRows).toEqual(mdRows);
    expect(sheet).toHaveLength(graded.length);
    // The workbook's rows in worst-first order, numbered 1, 2, ...; its raw cells, written by the one formatter, give the text of the reports.
    const worstFirst = findingsWorstFirst(graded);
    for (const [no, severity, rule, subject, value, limit, utilisation] of mdRows) {
      const k = Number(no) - 1;
      const [sNo, sSeverity, sRule, , sSubject, sValue, sLimit, sUnit, sUtilisation, , sId] = sheet[k];
      const f = worstFirst[k];
      expect([sRule, sId]).toEqual([f.rule, f.subject]);
      expect([sNo, String(sSeverity).toUpperCase(), sRule, sSubject]).toEqual([no, severity, rule, subject]);
      expect([sValue ?? null, sLimit ?? null, sUtilisation ?? null]).toEqual([f.value, f.limit, f.utilisation]);
      expect(sUnit ?? '').toBe(f.unit);
      expect(value).toBe(norm(formatQuantity(f.value, f.unit)));
      expect(limit).toBe(norm(formatQuantity(f.limit, f.unit)));
      expect(utilisation).toBe(norm(formatPercent(f.utilisation)));
    }
    // Every finding once.
    expect(new Set(mdRows.map((r) => r[0])).size).toBe(graded.length);
  });
});
