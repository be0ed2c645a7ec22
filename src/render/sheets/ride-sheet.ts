import type ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { sectionById } from '../model/find-table.ts';
import { setPrint } from './print-setup.ts';
import { NARROW_TEXT, tablesSheet, type SheetPart } from './report-sheet.ts';

/** The ride section's tables, each under the heading before it: the floor damping, then each case; the long texts wrap narrow, so the sheet prints upright. None where the model did not run. */
export function addRideSheet(wb: ExcelJS.Workbook, doc: ReportDocument): void {
  const ride = sectionById(doc, 'ride');
  if (!ride) return;
  const parts: SheetPart[] = [];
  let heading: string | undefined;
  for (const b of ride.blocks) {
    if (b.kind === 'heading') heading = b.text;
    if (b.kind !== 'table') continue;
    parts.push(heading ? { heading, table: b } : { table: b });
    heading = undefined;
  }
  setPrint(tablesSheet(wb, 'Ride', doc, parts, { maxWidth: NARROW_TEXT }).ws);
}
