// `axletree compare` end to end: the files it writes, their first page, the
// exit code, --json, and a refused file that writes nothing.
import ExcelJS from 'exceljs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { readdir, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { setIsComplete } from '../../src/node/write-file-set.ts';
import { CAUTIONS, SHORT_CAUTION } from '../../src/core/cautions.ts';
import { freshDir, REPO, runCli, type CliRun } from '../support/run-cli.ts';

const REAR = join(REPO, 'specs/demo-rear-axle.yaml');
const CENTRAL = join(REPO, 'specs/demo-two-crew.yaml');

let dir: string;
let r: CliRun;
beforeAll(async () => {
  dir = await freshDir('axletree-compare-');
  r = await runCli(['compare', REAR, CENTRAL, '--no-decisive', '--json', '--out', join(dir, 'out')], dir);
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

/** The first page: everything before the first section after the account. */
const firstPage = (text: string, next: string) => text.slice(0, text.indexOf(next));

describe('compare of the two demos', () => {
  it('writes the set, and prints compare.json on stdout', async () => {
    expect(r.code).toBe(0);
    const out = join(dir, 'out');
    const names = await readdir(out);
    for (const f of ['compare.md', 'compare.html', 'compare.xlsx', 'compare.json', 'manifest.json', 'drawing-A-side-elevation.svg', 'drawing-B-side-elevation.svg']) expect(names).toContain(f);
    expect(await setIsComplete(out)).toBe(true);
    expect(JSON.parse(r.out)).toEqual(JSON.parse(readFileSync(join(out, 'compare.json'), 'utf8')));
    expect(r.err).toContain(SHORT_CAUTION);
  });

  it('says on its first page why the verdicts differ, naming the deciding finding and the input', () => {
    const md = readFileSync(join(dir, 'out', 'compare.md'), 'utf8');
    const html = readFileSync(join(dir, 'out', 'compare.html'), 'utf8');
    const mdFirst = firstPage(md, '## Cautions');
    expect(mdFirst).toContain('## Why the verdicts differ');
    expect(mdFirst).toContain('balance.yoke-lift');
    expect(mdFirst).toContain('axle.x\\_mm');
    const htmlFirst = firstPage(html, '>Cautions<');
    expect(htmlFirst).toContain('Why the verdicts differ');
    expect(htmlFirst).toContain('balance.yoke-lift');
    expect(htmlFirst).toContain('axle.x_mm');
  });

  it('carries the cautions on every output', () => {
    const out = join(dir, 'out');
    for (const f of ['compare.md', 'compare.html']) {
      const text = readFileSync(join(out, f), 'utf8').replace(/\\/g, '').replace(/&quot;/g, '"');
      for (const c of CAUTIONS) expect(text, f).toContain(c);
    }
    expect(JSON.parse(readFileSync(join(out, 'compare.json'), 'utf8')).cautions).toEqual([...CAUTIONS]);
  });

  it('writes a workbook whose sheets each open with the caution: the account, the figures, the findings', async () => {
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(readFileSync(join(dir, 'out', 'compare.xlsx')) as unknown as ArrayBuffer);
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Why', 'Figures', 'Findings']);
    for (const ws of wb.worksheets) expect(ws.getCell('A1').text, ws.name).toBe(SHORT_CAUTION);
    const why = wb.getWorksheet('Why')!;
    const texts: string[] = [];
    why.eachRow((row) => texts.push(row.values ? String((row.values as unknown[]).join(' ')) : ''));
    expect(texts.join('\n')).toContain('balance.yoke-lift');
  });

  it('draws both builds\' side elevations at one scale', () => {
    const scale = (id: string) => /data-scale="([\d.]+)"/.exec(readFileSync(join(dir, 'out', `drawing-${id}-side-elevation.svg`), 'utf8'))?.[1];
    expect(scale('A')).toBeDefined();
    expect(scale('A')).toBe(scale('B'));
  });
});

describe('a refused file', () => {
  it('exits 2, names the file and writes nothing', async () => {
    const bad = join(dir, 'bad.yaml');
    writeFileSync(bad, readFileSync(CENTRAL, 'utf8').replace('spokes: 6', 'spokes: six'));
    const out = join(dir, 'refused');
    const got = await runCli(['compare', REAR, bad, '--no-decisive', '--out', out], dir);
    expect(got.code).toBe(2);
    expect(got.err).toContain('bad.yaml');
    expect(existsSync(out)).toBe(false);
  });

  it('a single file is refused as too few', async () => {
    const got = await runCli(['compare', REAR, '--out', join(dir, 'one')], dir);
    expect(got.code).toBe(2);
    expect(existsSync(join(dir, 'one'))).toBe(false);
  });
});
