// The ride results in the check's workbook, reports and output files.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import ExcelJS from 'exceljs';
import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { renderWorkbook } from '../../src/render/workbook.ts';
import { htmlOf, markdownOf } from '../support/report-outputs.ts';
import { drawReportPlots } from '../../src/render/report-plots.ts';
import { writeOutputs } from '../../src/node/write-outputs.ts';
import { SHORT_CAUTION } from '../../src/core/cautions.ts';
import type { CheckResult } from '../../src/core/result/check-result.ts';
import { sampleResult } from '../fixtures/sample-result.ts';
import { sampleRide } from '../fixtures/sample-ride.ts';
import { caseHeading } from '../../src/render/model/ride-blocks.ts';

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
    expect(ws.getRow(1).getCell(1).text).toBe(SHORT_CAUTION);
    // Each case's tables follow its heading; read the rows back under it.
    const rows: unknown[][] = [];
    ws.eachRow((row) => rows.push((row.values as unknown[]).slice(1)));
    const under = (heading: string) => {
      const at = rows.findIndex((r) => r[0] === heading && r.length === 1);
      expect(at, heading).toBeGreaterThan(0);
      return rows.slice(at);
    };
    const first = (from: unknown[][], label: string) => from.find((r) => r[0] === label);
    for (const r of result.ride!.cases) {
      const block = under(caseHeading(r));
      for (const c of r.crew) expect(first(block, c.role)?.slice(1, 4)).toEqual([c.rise_mm, c.airborne_ms, c.floor_dlf]);
      for (const w of r.wheels) expect(first(block, w.wheel)?.slice(1, 3)).toEqual([w.airborne_ms, w.dlf]);
      expect(first(block, 'Yoke force, least')?.slice(1, 3)).toEqual([r.yokeForceMin_N, 'N']);
      expect(first(block, 'Yoke force, greatest')?.slice(1, 3)).toEqual([r.yokeForceMax_N, 'N']);
      const decay = block.find((x) => String(x[0]).startsWith('Cycles until'));
      expect(decay?.[1]).toBe(r.decayCycles ?? 'not within the run');
    }
    const needed = first(rows, 'Floor damping ratio needed (tuner)');
    expect(needed?.[1]).toBe('none');
    expect(String(needed?.[3])).toMatch(/no floor damping/);
  });

  it('is left out when the ride model did not run', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load((await renderWorkbook(sampleResult())) as unknown as ExcelJS.Buffer);
    expect(wb.getWorksheet('Ride')).toBeUndefined();
  });
});

describe('the ride section of the report', () => {
  const result = withRide(0.2);
  const md = markdownOf(result);

  it('comes after the mass and balance, with a table per case, the plots linked in the appendix, keeping the cautions', () => {
    expect(md.indexOf('\n## Ride\n')).toBeGreaterThan(md.indexOf('\n## Mass and balance\n'));
    expect(md.indexOf('\n## Cautions\n')).toBeLessThan(md.indexOf('\n## Ride\n'));
    expect(md.indexOf('\n## Ride plots\n')).toBeGreaterThan(md.indexOf('\n# Appendix: the working and the evidence\n'));
    for (const r of result.ride!.cases) {
      expect(md).toContain(`(${r.case})\n`);
      expect(md).toContain(`](ride-${r.case}-heights.svg)`);
      expect(md).toContain(`](ride-${r.case}-floor-forces.svg)`);
    }
    expect(md).toMatch(/\| Floor damping ratio needed \(tuner\) \| 0\.2 \|/);
    expect(md).toContain(SHORT_CAUTION);
  });

  it('HTML holds the plots inline, with no image links left', () => {
    const html = htmlOf(result, drawReportPlots(result));
    expect(html).not.toMatch(/<img/);
    expect(html.match(/<figure class="plot"><svg/g)).toHaveLength(result.ride!.cases.length * 3 + (result.plots?.length ?? 0));
    expect(html).toMatch(/<h2>Ride<\/h2>/);
    expect(html).toMatch(/<h2>Ride plots<\/h2>/);
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
    expect(linked.length).toBe(15); // three plots for each of the five cases
    const files = await readdir(dir);
    for (const f of linked) expect(files).toContain(f);
  });
});
