import { drawingFile, drawingsOf } from '../src/render/report-drawings.ts';
import { settingOutSvg } from '../src/render/report-figures.ts';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { mkdtemp, readFile, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { OPTIONAL_FILES, OUTPUT_FILES, writeOutputs } from '../src/node/write-outputs.ts';
import type { PdfPrinter } from '../src/node/pdf-printer.ts';
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

  it('writes the summary beside the report, the teaching view when asked, and the PDFs the printer makes', async () => {
    const result = sampleResult();
    const printed: string[] = [];
    // A stand-in for the browser: it records the pages it is given and returns their titles as bytes.
    const printer: PdfPrinter = {
      print: (html) => {
        printed.push(html);
        return Promise.resolve(new TextEncoder().encode(/<title>(.*?)<\/title>/.exec(html)![1]));
      },
      close: () => Promise.resolve(),
    };
    await writeOutputs(result, dir, join(dir, 'spec.yaml'), { teach: true, printer });
    const names = await readdir(dir);
    for (const f of [OUTPUT_FILES.summary, ...Object.values(OPTIONAL_FILES)]) expect(names, f).toContain(f);
    const report = await readFile(join(dir, OUTPUT_FILES.html), 'utf8');
    const summary = await readFile(join(dir, OUTPUT_FILES.summary), 'utf8');
    expect(printed).toEqual([report, summary]);
    expect(await readFile(join(dir, OPTIONAL_FILES.reportPdf), 'utf8')).toBe(`Design-rule check: ${result.spec_name}`);
    expect(await readFile(join(dir, OPTIONAL_FILES.summaryPdf), 'utf8')).toBe(`Feasibility summary: ${result.spec_name}`);
    expect(await readFile(join(dir, OPTIONAL_FILES.teach), 'utf8')).toContain('<h2>How each rule family works</h2>');
  });

  it('writes nothing when printing fails: the outputs are one set', async () => {
    const printer: PdfPrinter = { print: () => Promise.reject(new Error('the browser went away')), close: () => Promise.resolve() };
    await expect(writeOutputs(sampleResult(), dir, join(dir, 'spec.yaml'), { printer })).rejects.toThrow(/went away/);
    expect(await readdir(dir)).toEqual([]);
  });

  it('writes no teaching view and no PDF unless asked', async () => {
    await writeOutputs(sampleResult(), dir, join(dir, 'spec.yaml'));
    const names = await readdir(dir);
    for (const f of Object.values(OPTIONAL_FILES)) expect(names).not.toContain(f);
  });
});
