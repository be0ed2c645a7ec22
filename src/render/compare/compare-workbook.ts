import ExcelJS from 'exceljs';
import type { ReportDocument } from '../model/document.ts';
import { tableById } from '../model/find-table.ts';
import { opensOn } from '../sheets/opens-on.ts';
import { setPrint } from '../sheets/print-setup.ts';
import { NARROW_TEXT, tablesSheet } from '../sheets/report-sheet.ts';
import { steadyWorkbookBytes } from '../steady-bytes.ts';
import type { DeflateRaw } from '../zip-deflate.ts';

/** Long sentences wrap in a column this wide. */
const SENTENCE_WIDTH = 90;

/**
 * The comparison as a workbook: why the verdicts differ (with the builds),
 * the figures side by side, and the findings that differ, each sheet opening
 * with the caution and set up to print. The tables are the document's.
 */
export async function renderCompareWorkbook(doc: ReportDocument, creator: string, deflateRaw?: DeflateRaw): Promise<Uint8Array> {
  const wb = new ExcelJS.Workbook();
  wb.creator = creator;
  wb.title = doc.title;
  const why = tablesSheet(wb, 'Why', doc, [{ table: tableById(doc, 'compare-account') }, { heading: 'The builds', table: tableById(doc, 'compare-builds') }], { maxWidth: SENTENCE_WIDTH });
  setPrint(why.ws);
  const figures = tablesSheet(wb, 'Figures', doc, [{ table: tableById(doc, 'compare-figures') }, { heading: 'Figures a build does not have', table: tableById(doc, 'compare-figures-not-applicable') }], { frozen: true, maxWidth: NARROW_TEXT });
  setPrint(figures.ws);
  const findings = tablesSheet(wb, 'Findings', doc, [
    { table: tableById(doc, 'compare-findings-differing') },
    { heading: 'Findings some builds do not have', table: tableById(doc, 'compare-findings-not-in-all') },
  ], { frozen: true, maxWidth: NARROW_TEXT });
  setPrint(findings.ws);
  opensOn(wb, why.ws);
  return steadyWorkbookBytes(wb, deflateRaw);
}
