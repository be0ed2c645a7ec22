// `axletree new` writes a fill-in file and never writes over one that exists
// unless told to; `check` never writes over the workbook it reads; a result
// workbook can be checked again.
import { describe, expect, it } from 'vitest';
import { existsSync, readFileSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { freshDir, REPO, runCli } from '../support/run-cli.ts';

const DEMO = join(REPO, 'specs', 'demo-two-crew.yaml');

describe('axletree new', () => {
  it('refuses to overwrite an existing file without --force, and replaces it with', async () => {
    const dir = await freshDir('axletree-new-');
    await writeFile(join(dir, 'mine.xlsx'), 'precious');
    const r = await runCli(['new', 'mine.xlsx'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('already exists; nothing was written');
    expect(readFileSync(join(dir, 'mine.xlsx'), 'utf8')).toBe('precious');
    const forced = await runCli(['new', 'mine.xlsx', '--force'], dir);
    expect(forced.code).toBe(0);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(join(dir, 'mine.xlsx'));
    expect(wb.getWorksheet('Axle')).toBeDefined();
  });

  it('refuses to write over the spec it is made from, even with --force', async () => {
    const dir = await freshDir('axletree-new-');
    await writeFile(join(dir, 'spec.yaml'), readFileSync(DEMO));
    const r = await runCli(['new', 'spec.yaml', '--from', 'spec.yaml', '--force'], dir);
    expect(r.code).toBe(2);
    expect(readFileSync(join(dir, 'spec.yaml')).equals(readFileSync(DEMO))).toBe(true);
  });

  it('refuses a spec with keys the file could not hold', async () => {
    const dir = await freshDir('axletree-new-');
    await writeFile(join(dir, 'spec.yaml'), `${readFileSync(DEMO, 'utf8')}\ncolour: red\n`);
    const r = await runCli(['new', 'x.xlsx', '--from', 'spec.yaml'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('colour');
    expect(existsSync(join(dir, 'x.xlsx'))).toBe(false);
  });

  it('writes a commented YAML file that checks as the spec it came from', async () => {
    const dir = await freshDir('axletree-new-');
    expect((await runCli(['new', 'spec.yaml', '--from', DEMO], dir)).code).toBe(0);
    const a = await runCli(['check', 'spec.yaml', '--out', 'a', '--json'], dir);
    const b = await runCli(['check', '--no-decisive', DEMO, '--out', 'b', '--json'], dir);
    expect(a.code).toBe(b.code);
    expect(JSON.parse(a.out).spec_as_checked).toEqual(JSON.parse(b.out).spec_as_checked);
  });

  it('writes a blank YAML file whose check names the keys still to fill', async () => {
    const dir = await freshDir('axletree-new-');
    expect((await runCli(['new', 'blank.yaml'], dir)).code).toBe(0);
    const text = readFileSync(join(dir, 'blank.yaml'), 'utf8');
    expect(text).toContain('# CAUTION: ');
    expect(text).toMatch(/# \(mm\) default 150\. How close to the frame/);
    const r = await runCli(['check', 'blank.yaml'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('name');
  });
});

describe('checking a workbook', () => {
  it('gives a result workbook that opens on the summary, ends with the spec sheets and can be checked again', async () => {
    const dir = await freshDir('axletree-new-');
    expect((await runCli(['new', 'spec.xlsx', '--from', DEMO], dir)).code).toBe(0);
    const first = await runCli(['check', '--no-decisive', 'spec.xlsx', '--out', 'out', '--json'], dir);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(join(dir, 'out', 'result.xlsx'));
    const names = wb.worksheets.map((w) => w.name);
    expect(names.slice(0, 2)).toEqual(['Summary', 'Findings']);
    const cover = names.indexOf('Start here');
    expect(names.slice(cover, cover + 3)).toEqual(['Start here', 'General', 'Box']);
    expect(names.slice(cover).every((n) => !['Summary', 'Findings', 'Sources'].includes(n))).toBe(true);
    const again = await runCli(['check', '--no-decisive', join('out', 'result.xlsx'), '--out', 'again', '--json'], dir);
    expect(again.code).toBe(first.code);
    expect(JSON.parse(again.out).spec_as_checked).toEqual(JSON.parse(first.out).spec_as_checked);
    expect(JSON.parse(again.out).verdict).toBe(JSON.parse(first.out).verdict);
  });

  it('never writes over the workbook being checked', async () => {
    const dir = await freshDir('axletree-new-');
    expect((await runCli(['new', 'spec.xlsx', '--from', DEMO], dir)).code).toBe(0);
    await runCli(['check', '--no-decisive', 'spec.xlsx', '--out', 'out'], dir);
    const before = readFileSync(join(dir, 'out', 'result.xlsx'));
    const r = await runCli(['check', '--no-decisive', join('out', 'result.xlsx'), '--out', 'out'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toContain('refusing to write');
    expect(readFileSync(join(dir, 'out', 'result.xlsx')).equals(before)).toBe(true);
  });
});
