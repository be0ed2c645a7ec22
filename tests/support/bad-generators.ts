// Inputs of the bad-input catalogue that are too big, repetitive or binary to
// keep as files: each builds its content when the case runs, in well under a
// second (the workbooks are written by hand, not through a spreadsheet library).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { parse, stringify } from 'yaml';
import { INPUT_LIMITS } from '../../src/core/input/input-limits.ts';
import { readZipDirectory, unpackPart } from '../../src/node/zip-directory.ts';
import { bareWorkbook, rowXml, sheetXml } from './bare-workbook.ts';
import { REPO, replaceOnce } from './run-cli.ts';
import { deflatedZeros, zipBytes, type ZipEntry } from './zip-writer.ts';
import { dropCsv, syntheticRelease, type SyntheticRelease } from '../../scripts/synthetic-drop-record.ts';

const L = INPUT_LIMITS;
const demoText = () => readFileSync(join(REPO, 'specs', 'demo-two-crew.yaml'), 'utf8');

/** The fill-in template's parts, unpacked, with one sheet's XML changed by `edit`. */
function templateWith(sheetPart: string, edit: (xml: string) => string): Uint8Array {
  const zip = new Uint8Array(readFileSync(join(REPO, 'templates', 'specification.xlsx')));
  const dir = readZipDirectory(zip, L.workbookParts);
  if (!dir.ok) throw new Error(dir.reason);
  const entries: ZipEntry[] = dir.parts.map((p) => {
    const data = unpackPart(zip, p, p.statedSize);
    if (!(data instanceof Buffer)) throw new Error(`cannot unpack ${p.name}`);
    return { name: p.name, data: p.name === sheetPart ? edit(data.toString('utf8')) : data };
  });
  return zipBytes(entries);
}

// The General sheet is the template's second sheet.
const GENERAL = 'xl/worksheets/sheet2.xml';

/** `count` list entries of the tiniest kind, as a flow list of empty mappings. */
const emptyMappings = (count: number) => `spec_version: 1\nloads: [${Array.from({ length: count }, () => '{}').join(',')}]\n`;

/** A floor sample pulled 10 mm off rest at 0.1 s, held, let go at 0.5 s: f_n 6 Hz, damping ratio 0.08. */
const PLUCK: SyntheticRelease = { held_mm: 10, natural_frequency_hz: 6, damping_ratio: 0.08, noise_mm: 0.05, pull_s: 0.1, release_s: 0.5, seed: 11 };

export const GENERATORS: Record<string, () => string | Uint8Array | Promise<string | Uint8Array>> = {
  /** A YAML document whose name is a string of 100,000 characters. */
  'long-name': () => `spec_version: 1\nname: ${'x'.repeat(100_000)}\n`,
  /** The demo with its wheel diameter written as a 100 kB unit string (the units library took 10 s over one). */
  'long-unit-string': () => replaceOnce(demoText(), 'diameter_mm: 940\n', `diameter_mm: "${'1 '.repeat(50_000)}mm"\n`),
  /** 400,000 loads in flow style: past the size limit on a text file. */
  'loads-past-size': () => emptyMappings(400_000),
  /** Loads past the limit on entries while the file stays under 100 kB. */
  'loads-past-entries': () => emptyMappings(L.textEntries + 1),
  /** The demo with 101 aliases of one anchor. */
  'many-aliases': () => `${demoText()}x_anchor: &a [1]\n${Array.from({ length: L.yamlAliases + 1 }, (_, i) => `x_${i}: *a`).join('\n')}\n`,
  /** Nine levels of ten aliases each (90 aliases, within the count) that would expand to a billion values. */
  'alias-expansion': () => {
    const levels = ['l0: &l0 [x, x, x, x, x, x, x, x, x, x]'];
    for (let k = 1; k <= 9; k++) levels.push(`l${k}: &l${k} [${Array.from({ length: 10 }, () => `*l${k - 1}`).join(', ')}]`);
    return `${levels.join('\n')}\n`;
  },
  /** Lists inside lists, past the limit on nesting. */
  'deep-brackets': () => `spec_version: 1\nloads: ${'['.repeat(L.textDepth + 1)}${']'.repeat(L.textDepth + 1)}\n`,
  /** The demo as JSON, led by a byte-order mark, with a whole-number key given as text: read past the mark to the schema. */
  'json-with-bom': () => {
    const spec = parse(demoText());
    spec.wheels.spokes = 'six';
    return `\uFEFF${JSON.stringify(spec, null, 2)}\n`;
  },
  /** The demo YAML led by a byte-order mark, with the same mistake. */
  'yaml-with-bom': () => `\uFEFF${replaceOnce(demoText(), 'spokes: 6\n', 'spokes: six\n')}`,
  /** The template with one cell at the last row of the General sheet. */
  'cell-at-last-row': () => templateWith(GENERAL, (xml) => xml.replace('</sheetData>', '<row r="1048576"><c r="A1048576" t="inlineStr"><is><t>x</t></is></c></row></sheetData>')),
  /** The template whose General sheet claims the whole grid as its range, with no cell out there. */
  'claimed-whole-grid': () => templateWith(GENERAL, (xml) => xml.replace(/<dimension ref="[^"]*"\/>/, '<dimension ref="A1:XFD1048576"/>')),
  /** The template with a data validation over all of column C of the General sheet, as a spreadsheet program writes one for a column selected whole. */
  'validation-whole-column': () => templateWith(GENERAL, (xml) => replaceOnce(xml, 'sqref="C3"', 'sqref="C3:C1048576"')),
  /** The template with a merge of the whole grid below its rows (the library ran out of memory at 4 GB). */
  'merge-whole-grid': () => templateWith(GENERAL, (xml) => replaceOnce(replaceOnce(xml, '<mergeCell ref="B1:F1"/>', '<mergeCell ref="B1:F1"/><mergeCell ref="A100:XFD1048576"/>'), '<mergeCells count="1"', '<mergeCells count="2"')),
  /** The template with a named range over the whole General sheet. */
  'name-whole-grid': () => templateWith('xl/workbook.xml', (xml) => replaceOnce(xml, '<calcPr', '<definedNames><definedName name="everything">General!$A$1:$XFD$1048576</definedName></definedNames><calcPr')),
  /** The template with column widths set out to column 100,000,000 (the library made an object per column). */
  'columns-past-format': () => templateWith(GENERAL, (xml) => replaceOnce(xml, '<col min="6" max="6"', '<col min="7" max="100000000" width="9"/><col min="6" max="6"')),
  /** A General sheet of rows one past the limit, one small cell each. */
  'rows-past-limit': () => {
    const rows = Array.from({ length: L.sheetRows + 1 }, (_, i) => `<row r="${i + 1}"><c r="A${i + 1}"><v>1</v></c></row>`).join('');
    return bareWorkbook([{ name: 'General', xml: sheetXml(rows) }]);
  },
  /** Cells one past the limit, in rows of 20 within the row limit. */
  'cells-past-limit': () => {
    const perRow = 20;
    const rows = Array.from({ length: Math.ceil((L.workbookCells + 1) / perRow) }, (_, i) => rowXml(i + 1, Array.from({ length: perRow }, () => 1))).join('');
    return bareWorkbook([{ name: 'General', xml: sheetXml(rows) }]);
  },
  /** A sheet of 200 MB of zeros whose directory states its size. */
  'zip-bomb': () => bareWorkbook([{ name: 'General', entry: deflatedZeros(200e6) }]),
  /** The same sheet whose directory states 1 kB: found out while unpacking. */
  'zip-bomb-understated': () => bareWorkbook([{ name: 'General', entry: { ...deflatedZeros(200e6), statedSize: 1000 } }]),
  /** A workbook of more parts than the limit. */
  'zip-many-parts': () => bareWorkbook([{ name: 'General', xml: sheetXml('') }], Array.from({ length: L.workbookParts }, (_, i) => ({ name: `xl/extra/part${i}.xml`, data: '<x/>' }))),
  /** A file one byte past the size limit on workbooks. */
  'workbook-past-size': () => new Uint8Array(L.workbookBytes + 1),
  /** The demo with 51 loads, one past the list's limit. */
  'loads-past-list-limit': () => {
    const spec = parse(demoText());
    spec.loads = Array.from({ length: 51 }, (_, i) => ({ ...spec.loads[0], name: `load ${i + 1}` }));
    return stringify(spec);
  },
  /** A stock instance of 101 priced stock lengths, one past the limit. */
  'stock-lengths-past-limit': () =>
    JSON.stringify({ kerf_mm: 3, stock: Array.from({ length: 101 }, (_, i) => ({ length_mm: 1000 + i, cost: 10 })), pieces: [{ length_mm: 500, quantity: 2 }] }, null, 2),
  /** The demo saved as UTF-16 (little-endian, with its byte-order mark), as some editors save "Unicode". */
  'yaml-utf16': () => new Uint8Array(Buffer.from(`\uFEFF${demoText()}`, 'utf16le')),
  /** A name in a legacy code page: "Ch\xe2teau" (Latin-1 â), which is no UTF-8. */
  'yaml-latin1': () => new Uint8Array(Buffer.from('spec_version: 1\nname: Ch\u00e2teau chariot\n', 'latin1')),
  /** Text named .xlsx. */
  'not-a-zip': () => 'spec_version: 1\n',
  // Numbers that are not numbers, solvers that do not stop (issue 15).
  /** A floor-test record of a floor held 10 mm down and let go. */
  'pluck-down-record': () => dropCsv(syntheticRelease(PLUCK)),
  /** The same, held 10 mm up. */
  'pluck-up-record': () => dropCsv(syntheticRelease({ ...PLUCK, held_mm: -10 })),
  /** A floor-test record that is a square wave of ±5 mm, period 0.2 s: no free vibration. */
  'square-wave-record': () => dropCsv({ t_s: Array.from({ length: 2000 }, (_, i) => i / 1000), x_mm: Array.from({ length: 2000 }, (_, i) => (Math.floor(i / 100) % 2 ? 5 : -5)) }),
  /** A stock instance with 5000 priced lengths. */
  'stock-5000-lengths': () => JSON.stringify({ kerf_mm: 3, stock: Array.from({ length: 5000 }, (_, i) => ({ length_mm: 1000 + i, cost: 10 + i / 100 })), pieces: [{ length_mm: 900, quantity: 5 }, { length_mm: 450, quantity: 7 }] }),
  /** The demo with 41 small extra parts of white ash, 1 to 301 of each. */
  'demo-41-pegs': () => {
    const spec = parse(readFileSync(join(REPO, 'specs', 'demo-two-crew.yaml'), 'utf8')) as { stock: Record<string, unknown> };
    spec.stock.extra_parts = Array.from({ length: 41 }, (_, i) => ({ name: `peg ${i + 1}`, species: 'white-ash', length_mm: 10 + i, width_mm: 5, thickness_mm: 5, quantity: 1 + (i % 7) * 50 }));
    return stringify(spec);
  },
};
