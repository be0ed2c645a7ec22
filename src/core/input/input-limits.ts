// The most any one input file may hold, each refused with its own message
// before the reader spends time or memory on it. A full specification is
// about 5 kB of YAML (a few hundred entries) and a filled workbook, with a
// check result's own sheets, about 150 kB and 7,000 cells; every limit
// leaves a wide margin over that and stops an input long before it costs
// more than a few hundred megabytes or a few seconds (measured: README,
// "Input limits").
import { formatNumber } from '../format/number-format.ts';

export const INPUT_LIMITS = {
  /** A YAML or JSON file (a specification or a stock instance), bytes. */
  textBytes: 1_000_000,
  /** Entries of a YAML or JSON file: keys, values, list items and collections. */
  textEntries: 20_000,
  /** Lists and mappings written inside one another with brackets ([ ] and { }), levels. */
  textDepth: 64,
  /** Aliases (`*name`) in a YAML file, and values they may expand to in all. */
  yamlAliases: 100,
  /** A fill-in workbook (.xlsx), bytes. */
  workbookBytes: 10_000_000,
  /** Parts (files) inside the workbook's zip container. */
  workbookParts: 1_000,
  /** The workbook's parts unpacked, bytes in all. */
  workbookUnpacked: 20_000_000,
  /** The last row of any one sheet. */
  sheetRows: 10_000,
  /** The last column of any one sheet (column ALL). */
  sheetColumns: 1_000,
  /** Cells in all sheets together. */
  workbookCells: 100_000,
  /** Cells covered by merged cells, data validations and named ranges, in all: the spreadsheet library stores each one. */
  rangeCells: 100_000,
  /** A floor-test record (.csv), bytes: about a million samples. */
  csvBytes: 20_000_000,
  /** A value written with its unit as text ("5 ft 4 in"), characters. */
  unitStringChars: 64,
} as const;

/** A size in bytes as a message gives it, to four figures so that a file just past a limit does not read as equal to it: `1.004 MB`. */
export function bytesText(bytes: number): string {
  if (bytes >= 1e9) return `${formatNumber(bytes / 1e9, '', 4)} GB`;
  if (bytes >= 1e6) return `${formatNumber(bytes / 1e6, '', 4)} MB`;
  if (bytes >= 1e3) return `${formatNumber(bytes / 1e3, '', 4)} kB`;
  return `${formatNumber(bytes, 'count')} bytes`;
}
