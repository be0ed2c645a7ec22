import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { expandInputs, isSpecName, proposalNames } from '../../src/node/review/expand-inputs.ts';
import { freshDir } from '../support/run-cli.ts';

// What a batch is made of: files as given, folders as the specifications in
// them, the same file once, and a folder name for each proposal.

describe('the proposals of a batch', () => {
  it('expands a folder to the specifications directly in it, in name order, each file once', async () => {
    const dir = await freshDir('axletree-expand-');
    await mkdir(join(dir, 'pile', 'older'), { recursive: true });
    for (const f of ['b.yaml', 'a.yml', 'c.json', 'd.xlsx', 'notes.txt', 'drop.csv', '.hidden.yaml', '~$d.xlsx', 'older/e.yaml']) await writeFile(join(dir, 'pile', f), '');
    const got = await expandInputs(['pile', 'pile/b.yaml', 'missing.yaml'], dir);
    expect(got.map((g) => g.file)).toEqual([join('pile', 'a.yml'), join('pile', 'b.yaml'), join('pile', 'c.json'), join('pile', 'd.xlsx'), 'missing.yaml']);
    expect(got.map((g) => g.input)).toEqual([...['a.yml', 'b.yaml', 'c.json', 'd.xlsx'].map((f) => join(dir, 'pile', f)), join(dir, 'missing.yaml')]);
    expect(got.every((g) => g.refused === undefined)).toBe(true);
  });

  it('keeps a folder without a specification as a proposal that cannot be checked', async () => {
    const dir = await freshDir('axletree-expand-');
    await mkdir(join(dir, 'empty'));
    const [only] = await expandInputs(['empty'], dir);
    expect(only).toMatchObject({ file: 'empty', refused: expect.stringContaining('holds no specification') });
  });

  it('knows a specification by its name', () => {
    expect(['a.yaml', 'a.YML', 'a.json', 'a.xlsx'].map(isSpecName)).toEqual([true, true, true, true]);
    expect(['a.csv', '.a.yaml', '~$a.xlsx', 'yaml'].map(isSpecName)).toEqual([false, false, false, false]);
  });

  it('names each proposal by its file, made unique where two share a name in any case', () => {
    expect(proposalNames(['x/demo.yaml', 'y/demo.yaml', 'z/Demo.json', 'demo-2.yaml', 'w/other.xlsx'])).toEqual(['demo', 'demo-2', 'Demo-3', 'demo-2-2', 'other']);
  });
});
