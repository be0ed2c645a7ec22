import { basename, extname, join, resolve } from 'node:path';
import { readSpec } from '../../src/node/read-spec.ts';
import { OutputIsInputError } from '../../src/node/atomic-write.ts';
import { resultJson, writeOutputs } from '../../src/node/write-outputs.ts';
import { pdfPrinter, type PdfPrinter } from '../../src/node/pdf-printer.ts';
import { checkLoadingSolver } from '../../src/node/solver-on-demand.ts';
import { prepareSpec, type Prepared } from '../../src/core/spec/prepare.ts';
import type { RulesData } from '../../src/core/data/rules-data.ts';
import type { Console } from '../console.ts';
import { EXIT, exitOfVerdict } from '../exit-codes.ts';
import { formatIssues } from '../format-issues.ts';
import { summary } from '../summary.ts';
import { loadData } from '../load-data.ts';

export interface CheckOptions {
  out?: string;
  json: boolean;
  /** Search for the decisive inputs and their break-even values. */
  decisive: boolean;
  /** Also write the teaching view, teach.html. */
  teach?: boolean;
  /** Also print report.pdf and summary.pdf, where a browser is installed. */
  pdf?: boolean;
}

/** The printer --pdf asks for, or undefined (and one line on stderr) where no browser can print. */
async function printerFor(opts: CheckOptions, con: Console): Promise<PdfPrinter | undefined> {
  if (!opts.pdf) return undefined;
  const got = await pdfPrinter();
  if ('printer' in got) return got.printer;
  con.err(`axletree: --pdf: ${got.why}; wrote the HTML only (install Debian's chromium package to print).\n`);
  return undefined;
}

export async function checkCommand(file: string, opts: CheckOptions, con: Console): Promise<number> {
  const data = loadData(con);
  if (!data) return EXIT.badInput;
  const input = resolve(con.cwd, file);
  const read = await readSpec(input);
  if (!read.ok) {
    con.err(formatIssues(file, read.issues));
    return EXIT.badInput;
  }
  const prepared = prepareSpec(read.raw, data);
  if (!prepared.ok) {
    con.err(formatIssues(file, prepared.issues, read.locate));
    return EXIT.badInput;
  }
  return checkAndWrite(file, input, read.raw, prepared, data, opts, con);
}

async function checkAndWrite(file: string, input: string, raw: unknown, prepared: Extract<Prepared, { ok: true }>, data: RulesData, opts: CheckOptions, con: Console): Promise<number> {
  // The LP solver is loaded only where the stock plan needs it.
  const result = await checkLoadingSolver(prepared.spec, prepared.entries, data, { decisive: opts.decisive });
  result.input = raw;
  const dir = resolve(con.cwd, opts.out ?? join('axletree-out', basename(file, extname(file))));
  let written: string[];
  const printer = await printerFor(opts, con);
  try {
    written = await writeOutputs(result, dir, input, { teach: opts.teach, printer });
  } catch (e) {
    if (e instanceof OutputIsInputError) {
      con.err(`axletree: ${e.message}; choose another --out directory.\n`);
      return EXIT.badInput;
    }
    throw e;
  } finally {
    await printer?.close();
  }
  if (opts.json) {
    con.out(resultJson(result));
    con.err(summary(result, written));
  } else {
    con.out(summary(result, written));
  }
  return exitOfVerdict(result.verdict);
}
