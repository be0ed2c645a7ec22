// A check thread of a batch review: takes one proposal at a time from the
// main thread, checks it, writes its outputs and answers its row. Started by
// check-thread.ts (from the TypeScript source through tsx, or as the
// bundle's review-worker.mjs).
import { parentPort } from 'node:worker_threads';
import { loadRulesDataFast } from '../rules-data-snapshot.ts';
import { loadLpSolver } from '../load-lp-solver.ts';
import { pdfPrinter } from '../pdf-printer.ts';
import { checkProposal, type ProposalTools } from './check-proposal.ts';
import type { ThreadReply, ThreadRequest } from './thread-messages.ts';
import type { ProposalSettings } from './proposal-job.ts';

const port = parentPort!;
let tools: Promise<ProposalTools & { note?: string }> | undefined;

/** Loaded on the first proposal: the main thread checked the rules data already. */
async function load(s: ProposalSettings): Promise<ProposalTools & { note?: string }> {
  const data = loadRulesDataFast(s.rulesDir);
  const lp = await loadLpSolver();
  if (!s.pdf) return { data, lp };
  const got = await pdfPrinter();
  return 'printer' in got ? { data, lp, printer: got.printer } : { data, lp, note: `--pdf: ${got.why}; wrote the HTML only (install Debian's chromium package to print)` };
}

async function handle(m: ThreadRequest): Promise<void> {
  if (m.kind === 'close') {
    // The printer is a browser process of its own: closed here, or it would outlive the batch.
    await (await tools)?.printer?.close();
    process.exit(0);
  }
  let reply: ThreadReply;
  try {
    tools ??= load(m.settings);
    const t = await tools;
    const done = await checkProposal(m.job, m.settings, t);
    reply = { id: m.id, done: t.note ? { ...done, note: t.note } : done };
  } catch (e) {
    reply = { id: m.id, fault: e instanceof Error ? (e.stack ?? e.message) : String(e) };
  }
  port.postMessage(reply);
}

port.on('message', (m: ThreadRequest) => void handle(m));
