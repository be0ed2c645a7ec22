// The input limits refuse only what no real specification comes near: a
// specification with every list at its longest (the schema's maxItems) is
// well inside each of them as YAML, as JSON and as a filled workbook. And
// each limit holds at its boundary: the limit itself passes, one more fails.
import { describe, expect, it } from 'vitest';
import { stringify } from 'yaml';
import { INPUT_LIMITS } from '../../src/core/input/input-limits.ts';
import { parseSpecText } from '../../src/core/input/parse-spec-text.ts';
import { entryLimitIssue } from '../../src/core/input/text-entries.ts';
import { specificationWorkbook } from '../../src/render/spec-workbook/spec-sheets.ts';
import { scanSheet } from '../../src/node/workbook-limits.ts';
import { readZipDirectory, unpackPart } from '../../src/node/zip-directory.ts';
import { CHOICES, demoRaw } from '../support/spec-workbook.ts';

const L = INPUT_LIMITS;
// Each measure of the fullest specification stays under this share of its limit.
const MARGIN = 1 / 4;

/** The demo with every list as long as the schema allows. */
function fullest(): Record<string, any> {
  const spec = demoRaw() as Record<string, any>;
  const many = <T>(n: number, make: (i: number) => T) => Array.from({ length: n }, (_, i) => make(i));
  spec.loads = many(50, (i) => ({ ...spec.loads[0], name: `load number ${i + 1} with a longer name` }));
  spec.lashings = many(20, (i) => ({ ...spec.lashings[i % spec.lashings.length] }));
  spec.crew = many(4, (i) => ({ ...spec.crew[i % spec.crew.length], role: `crew member ${i + 1}` }));
  spec.stock.lumber = many(20, (i) => ({ species: 'white-oak', width_mm: 100 + i, thickness_mm: 50, lengths_mm: many(20, (j) => 1800 + 300 * j), price_per_m3: 900 }));
  spec.stock.extra_parts = many(50, (i) => ({ name: `spare part ${i + 1}`, species: 'ash', length_mm: 1000, width_mm: 40, thickness_mm: 30 }));
  return spec;
}

describe('the input limits', () => {
  it('leave a wide margin over the fullest specification as YAML and as JSON', () => {
    for (const text of [stringify(fullest()), JSON.stringify(fullest(), null, 2)]) {
      expect(Buffer.byteLength(text)).toBeLessThan(L.textBytes * MARGIN);
      expect(entryLimitIssue(text, { textEntries: L.textEntries * MARGIN, textDepth: 8 })).toBeUndefined();
      expect(parseSpecText(text, 'YAML').ok).toBe(true);
    }
  });

  it('leave a wide margin over the fullest specification as a filled workbook', async () => {
    const zip = new Uint8Array(await specificationWorkbook(fullest(), CHOICES).xlsx.writeBuffer());
    expect(zip.length).toBeLessThan(L.workbookBytes * MARGIN);
    const dir = readZipDirectory(zip, L.workbookParts);
    if (!dir.ok) throw new Error(dir.reason);
    expect(dir.count).toBeLessThan(L.workbookParts * MARGIN);
    let unpacked = 0;
    let cells = 0;
    for (const part of dir.parts) {
      const data = unpackPart(zip, part, part.statedSize);
      if (!(data instanceof Buffer)) throw new Error(`${part.name} does not unpack`);
      unpacked += data.length;
      if (!/worksheets\/sheet\d+\.xml$/.test(part.name)) continue;
      const s = scanSheet(data.toString('latin1'), Infinity);
      cells += s.cells;
      expect(Math.max(s.lastRow, s.stated.row), part.name).toBeLessThan(L.sheetRows * MARGIN);
      expect(Math.max(s.lastColumn, s.stated.column), part.name).toBeLessThan(L.sheetColumns * MARGIN);
    }
    expect(unpacked).toBeLessThan(L.workbookUnpacked * MARGIN);
    expect(cells).toBeLessThan(L.workbookCells * MARGIN);
  });

  it('count entries to the limit and refuse one more', () => {
    // A flow list of n empty mappings: n mappings, n - 1 commas, the list, the key.
    const list = (n: number) => `k: [${Array.from({ length: n }, () => '{}').join(',')}]`;
    const entries = (n: number) => n + (n - 1) + 2;
    expect(entryLimitIssue(list(10), { textEntries: entries(10), textDepth: 4 })).toBeUndefined();
    expect(entryLimitIssue(list(10), { textEntries: entries(10) - 1, textDepth: 4 })?.issue.message).toContain(`more than ${entries(10) - 1} entries`);
  });

  it('nest brackets to the limit and refuse one more level, at its bracket', () => {
    const nest = (n: number) => `k: ${'['.repeat(n)}${']'.repeat(n)}`;
    expect(entryLimitIssue(nest(L.textDepth))).toBeUndefined();
    const over = entryLimitIssue(nest(L.textDepth + 1));
    expect(over?.issue.message).toContain(`more than ${L.textDepth} lists or mappings`);
    expect(over?.offset).toBe('k: '.length + L.textDepth);
  });
});
