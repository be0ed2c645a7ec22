import type { RulesData } from '../../core/data/rules-data.ts';
import { runCheck } from '../../core/pipeline/run-check.ts';
import { checkedRow, uncheckedRow } from '../../core/review/review-row.ts';
import { prepareSpec } from '../../core/spec/prepare.ts';
import type { LpSolver } from '../../core/stock/cutting-types.ts';
import { OutputIsInputError } from '../atomic-write.ts';
import { OutputError } from '../output-error.ts';
import type { PdfPrinter } from '../pdf-printer.ts';
import { writeOutputs } from '../write-outputs.ts';
import type { ProposalDone, ProposalJob, ProposalSettings } from './proposal-job.ts';

export interface ProposalTools {
  data: RulesData;
  lp?: LpSolver;
  printer?: PdfPrinter;
}

/**
 * One proposal of a batch, as `axletree check` does one file: check it and
 * write its full outputs into its own folder (the plots drawn on this
 * thread: the batch keeps every core busy with proposals). Returns its row of
 * the review table; an output place refused is its row's error.
 */
export async function checkProposal(job: ProposalJob, s: ProposalSettings, t: ProposalTools): Promise<ProposalDone> {
  const prepared = prepareSpec(job.raw, t.data);
  // The main thread prepared it already; a change between the two would be a fault.
  if (!prepared.ok) throw new Error(`${job.file} prepared in the main thread but not in the check thread`);
  const { spec, entries } = prepared;
  const result = runCheck(spec, entries, t.data, { lp: t.lp, decisive: s.workLimit !== null, decisiveWorkLimit: s.workLimit ?? undefined });
  result.input = job.raw;
  try {
    await writeOutputs(result, job.dir, job.input, { teach: s.teach, printer: t.printer });
  } catch (e) {
    if (e instanceof OutputIsInputError || e instanceof OutputError) return { row: uncheckedRow(job.file, job.name, 'refused', e.message) };
    throw e;
  }
  return { row: checkedRow(job.file, job.name, result) };
}
