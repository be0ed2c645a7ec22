import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdtemp, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCheck } from '../src/core/pipeline/run-check.ts';
import { prepareSpec } from '../src/core/spec/prepare.ts';
import { htmlOf, markdownOf } from './support/report-outputs.ts';
import { drawReportPlots } from '../src/render/report-plots.ts';
import { SECTIONS } from '../src/render/model/section-titles.ts';
import { writeOutputs } from '../src/node/write-outputs.ts';
import { readDemo, rulesData } from './support/fixtures.ts';

// The balance and turn plots in the check's outputs: linked with captions
// from report.md, written beside it, inline in report.html.

describe('plots in the report', () => {
  const p = prepareSpec(readDemo('demo-two-crew'), rulesData);
  if (!p.ok) throw new Error('demo does not prepare');
  const result = runCheck(p.spec, p.entries, rulesData);
  const md = markdownOf(result);
  let dir = '';
  let written: string[] = [];
  let html = '';

  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'axletree-plots-'));
    written = await writeOutputs(result, dir, join(dir, 'spec.yaml'));
    html = htmlOf(result, drawReportPlots(result));
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('carries the yoke-load and turn-speed plots as data in the result', () => {
    expect(result.plots!.map((x) => x.id)).toEqual(['yoke-load', 'turn-speed']);
  });

  it('links each from report.md with its caption, under its own heading', () => {
    expect(md).toContain(`\n## ${SECTIONS.plots.title}\n`);
    for (const plot of result.plots!) {
      expect(md).toContain(`](plot-${plot.id}.svg)`);
      expect(md).toContain(plot.caption.slice(0, 30));
    }
  });

  it('writes each beside the report, drawn, with every legend label', async () => {
    for (const plot of result.plots!) {
      const file = join(dir, `plot-${plot.id}.svg`);
      expect(written).toContain(file);
      const svg = await readFile(file, 'utf8');
      expect(svg.startsWith('<svg ')).toBe(true);
      // Text is escaped as XML; the labels here hold none of & < >.
      for (const label of [...plot.lines, ...plot.rules].map((x) => x.label)) expect(svg).toContain(`>${label}</text>`);
    }
  });

  it('puts each inline in report.html, with no image links', () => {
    expect(html).not.toMatch(/<img/);
    const inline = html.match(/<figure class="plot"><svg/g) ?? [];
    expect(inline).toHaveLength(result.plots!.length + result.ride!.cases.length * 3);
  });
});
