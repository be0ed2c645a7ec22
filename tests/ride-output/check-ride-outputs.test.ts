// The ride results in the check's workbook, reports and output files.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { renderWorkbook } from '../../src/render/workbook.ts';
import { renderMarkdown } from '../../src/render/report-md.ts';
import { drawReportPlots } from '../../src/render/report-plots.ts';
import { renderHtml } from '../../src/render/report-html.ts';
import { writeOutputs } from '../../src/node/write-outputs.ts';
import { SHORT_CAUTION } from '../../src/core/cautions.ts';
import type { CheckResult } from '../../src/core/result/check-result.ts';
import { sampleResult } from '../fixtures/sample-result.ts';
import { sampleRide } from '../fixtures/sample-ride.ts';

function withRide(needed: number | null = null): CheckResult {
  return { ...sampleResult(), ride: sampleRide(needed) };
}

describe('the Ride sheet', () => {
  it('follows the Loads sheet and lists every case, crew member, wheel and the yoke', async () => {
    const result = withRide();
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await renderWorkbook(result)) as unknown as ExcelJS.Buffer);
    const names = wb.worksheets.map((w) => w.name);
    expect(names.indexOf('Ride')).toBe(names.indexOf('Loads') + 1);
    const ws = wb.getWorksheet('Ride')!;
    expect(String(ws.getRow(1).getCell(1).value)).toBe(SHORT_CAUTION);
    const rows: unknown[][] = [];
    ws.eachRow((row, n) => {
      if (n > 2) rows.push((row.values as unknown[]).slice(1));
    });
    const find = (c: string, item: string, quantity: string) => rows.find((r) => String(r[0]).endsWith(`(${c})`) && r[1] === item && r[2] === quantity)?.[3];
    for (const r of result.ride!.cases) {
      for (const c of r.crew) {
        expect(find(r.case, c.role, 'rise above standing')).toBe(c.rise_mm);
        expect(find(r.case, c.role, 'time off the floor')).toBe(c.airborne_ms);
        expect(find(r.case, c.role, 'floor dynamic load factor')).toBe(c.floor_dlf);
      }
      for (const w of r.wheels) expect(find(r.case, `${w.wheel} wheel`, 'ground dynamic load factor')).toBe(w.dlf);
      expect(find(r.case, 'yoke', 'least force')).toBe(r.yokeForceMin_N);
      expect(find(r.case, 'yoke', 'greatest force')).toBe(r.yokeForceMax_N);
      expect(find(r.case, 'crew', 'cycles to fall below 10 %') ?? null).toBe(r.decayCycles);
    }
    const needed = rows.find((r) => r[2] === 'damping ratio needed (tuner)');
    expect(needed?.[3] ?? null).toBeNull(); // an empty cell
    expect(String(needed?.[5])).toMatch(/no floor damping/);
  });

  it('is left out when the ride model did not run', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await renderWorkbook(sampleResult())) as unknown as ExcelJS.Buffer);
    expect(wb.getWorksheet('Ride')).toBeUndefined();
  });
});

describe('the ride section of the report', () => {
  const result = withRide(0.2);
  const md = renderMarkdown(result);

  it('comes after the loads, with a table per case and the plots linked, keeping the cautions', () => {
    expect(md.indexOf('\n## Ride\n')).toBeGreaterThan(md.indexOf('\n## Loads\n'));
    expect(md.indexOf('\n## Cautions\n')).toBeLessThan(md.indexOf('\n## Ride\n'));
    for (const r of result.ride!.cases) {
      expect(md).toContain(`(${r.case})\n`);
      expect(md).toContain(`](ride-${r.case}-heights.svg)`);
      expect(md).toContain(`](ride-${r.case}-floor-forces.svg)`);
    }
    expect(md).toMatch(/damping ratio of at least 0\.200/);
    expect(md).toContain(SHORT_CAUTION);
  });

  it('HTML holds the plots inline, with no image links left', async () => {
    const html = renderHtml(result, await drawReportPlots(result));
    expect(html).not.toMatch(/<img/);
    expect(html.match(/<span class="plot"><svg/g)).toHaveLength(result.ride!.cases.length * 3 + (result.plots?.length ?? 0));
    expect(html).toMatch(/<h2 class="new-page">Ride<\/h2>/);
  });
});

describe('writeOutputs with ride results', () => {
  let dir: string;
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'axletree-ride-out-'));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('writes every plot the Markdown report links, beside it', async () => {
    await writeOutputs(withRide(), dir, join(dir, 'spec.yaml'));
    const md = await readFile(join(dir, 'report.md'), 'utf8');
    const linked = [...md.matchAll(/\]\((ride-[^)]+\.svg)\)/g)].map((m) => m[1]);
    expect(linked.length).toBe(9);
    const files = await readdir(dir);
    for (const f of linked) expect(files).toContain(f);
  });
});
