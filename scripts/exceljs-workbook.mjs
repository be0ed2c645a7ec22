// What the bundled command takes of the workbook library: its Workbook, the
// one export our sources use at run time (the rest of what they name is
// types). The package's own entry also loads its streaming reader and
// writer, which nothing here uses; left out, the bundle is about a third
// smaller and a fresh `check` loads about a tenth of a second less code.
// scripts/bundle.ts resolves `exceljs` to this file; tests/cli/built-bin
// compares the workbooks the bundle writes with the sources'.
import Workbook from 'exceljs/lib/doc/workbook.js';

export default { Workbook };
