import type ExcelJS from 'exceljs';

/** The workbook opens on this sheet: it is the active tab and the only one selected. */
export function opensOn(wb: ExcelJS.Workbook, ws: ExcelJS.Worksheet): void {
  const index = wb.worksheets.indexOf(ws);
  if (index < 0) throw new Error(`the sheet "${ws.name}" is not in this workbook`);
  wb.views = [{ x: 0, y: 0, width: 24000, height: 15000, firstSheet: 0, activeTab: index, visibility: 'visible' }];
  for (const other of wb.worksheets) {
    const [view, ...rest] = other.views.length ? other.views : [{}];
    // The writer honours `tabSelected` though its types do not list it.
    const selected: Partial<ExcelJS.WorksheetView> & { tabSelected: boolean } = { ...view, tabSelected: other === ws };
    other.views = [selected, ...rest];
  }
}
