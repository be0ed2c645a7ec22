// The fewest parts a spreadsheet reader needs to open a workbook, written
// by hand: for the bad-input catalogue's workbooks, which are too big to
// build cell by cell through a spreadsheet library in a test's time.
import { zipBytes, type ZipEntry } from './zip-writer.ts';

const MAIN = 'http://schemas.openxmlformats.org/spreadsheetml/2006/main';
const REL = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships';
const SHEET_REL = `${REL}/worksheet`;

export interface BareSheet {
  name: string;
  /** The worksheet's XML; or `entry` for a sheet part built elsewhere (deflated zeros). */
  xml?: string;
  entry?: Omit<ZipEntry, 'name'>;
}

/** A worksheet's XML around rows already written as `<row>` elements; `dimension` as the sheet states it, if at all. */
export function sheetXml(rows: string, dimension?: string): string {
  const dim = dimension ? `<dimension ref="${dimension}"/>` : '';
  return `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n<worksheet xmlns="${MAIN}" xmlns:r="${REL}">${dim}<sheetData>${rows}</sheetData></worksheet>`;
}

/** One row of inline-string and number cells, from column A. */
export function rowXml(r: number, values: readonly (string | number)[]): string {
  const cells = values.map((v, i) => {
    const ref = `${String.fromCharCode(65 + i)}${r}`;
    return typeof v === 'number' ? `<c r="${ref}"><v>${v}</v></c>` : `<c r="${ref}" t="inlineStr"><is><t>${v}</t></is></c>`;
  });
  return `<row r="${r}">${cells.join('')}</row>`;
}

/** The bytes of a workbook holding the sheets, in order, plus any extra zip entries. */
export function bareWorkbook(sheets: readonly BareSheet[], extra: readonly ZipEntry[] = []): Uint8Array {
  const list = sheets.map((s, i) => `<sheet name="${s.name}" sheetId="${i + 1}" r:id="rId${i + 1}"/>`).join('');
  const rels = sheets.map((_, i) => `<Relationship Id="rId${i + 1}" Type="${SHEET_REL}" Target="worksheets/sheet${i + 1}.xml"/>`).join('');
  const types = sheets.map((_, i) => `<Override PartName="/xl/worksheets/sheet${i + 1}.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.worksheet+xml"/>`).join('');
  return zipBytes([
    {
      name: '[Content_Types].xml',
      data: `<?xml version="1.0" encoding="UTF-8"?><Types xmlns="http://schemas.openxmlformats.org/package/2006/content-types"><Default Extension="rels" ContentType="application/vnd.openxmlformats-package.relationships+xml"/><Default Extension="xml" ContentType="application/xml"/><Override PartName="/xl/workbook.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheet.main+xml"/>${types}</Types>`,
    },
    { name: '_rels/.rels', data: `<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships"><Relationship Id="rId1" Type="${REL}/officeDocument" Target="xl/workbook.xml"/></Relationships>` },
    { name: 'xl/workbook.xml', data: `<?xml version="1.0" encoding="UTF-8"?><workbook xmlns="${MAIN}" xmlns:r="${REL}"><sheets>${list}</sheets></workbook>` },
    { name: 'xl/_rels/workbook.xml.rels', data: `<?xml version="1.0" encoding="UTF-8"?><Relationships xmlns="http://schemas.openxmlformats.org/package/2006/relationships">${rels}</Relationships>` },
    ...sheets.map((s, i) => ({ name: `xl/worksheets/sheet${i + 1}.xml`, ...(s.entry ?? { data: s.xml ?? sheetXml('') }) })),
    ...extra,
  ]);
}
