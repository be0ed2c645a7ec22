import { drawingFile, drawingsOf } from '../src/render/report-drawings.ts';
import { settingOutSvg } from '../src/render/report-figures.ts';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { mkdtemp, readFile, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { OUTPUT_FILES, writeOutputs } from '../src/node/write-outputs.ts';
import { MANIFEST } from '../src/node/write-file-set.ts';
import { sampleResult } from './fixtures/sample-result.ts';

describe('writeOutputs', () => {
  let dir: string;
  beforeEach(async () => {
    dir = await mkdtemp(join(tmpdir(), 'axletree-out-'));
  });
  afterEach(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('writes the setting-out drawing beside the Markdown report that links it', async () => {
    const result = sampleResult();
    const written = await writeOutputs(result, dir, join(dir, 'spec.yaml'));
    expect(written).toContain(join(dir, OUTPUT_FILES.settingOut));
    expect((await readdir(dir)).sort()).toEqual([...Object.values(OUTPUT_FILES), ...drawingsOf(result).map((d) => drawingFile(d.id)), MANIFEST].sort());
    const svg = await readFile(join(dir, OUTPUT_FILES.settingOut), 'utf8');
    expect(svg).toBe(`${settingOutSvg(result)}\n`);
    const md = await readFile(join(dir, OUTPUT_FILES.markdown), 'utf8');
    expect(md).toContain(`](${OUTPUT_FILES.settingOut})`);
  });

  it('refuses to write the drawing over the input', async () => {
    await expect(writeOutputs(sampleResult(), dir, join(dir, OUTPUT_FILES.settingOut))).rejects.toThrow();
    expect(await readdir(dir)).toEqual([]);
  });
});
