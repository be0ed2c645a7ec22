import { readFile } from 'node:fs/promises';
import { basename, extname, join, resolve } from 'node:path';
import { RULES } from '../../src/core/rules/index.ts';
import { sizeFound, startSizing, type SizeResult } from '../../src/core/size/size-run.ts';
import { formatQuantity } from '../../src/core/format/number-format.ts';
import { loadLpSolver } from '../../src/node/load-lp-solver.ts';
import { startProgress } from '../../src/node/progress.ts';
import { writeFileSet } from '../../src/node/write-file-set.ts';
import { sizeFiles } from '../../src/render/size/size-files.ts';
import type { Console } from '../console.ts';
import { EXIT } from '../exit-codes.ts';
import { loadData } from '../load-data.ts';
import { readPreparedSpec } from '../read-prepared-spec.ts';
import { writeOrRefuse } from '../write-or-refuse.ts';

export interface SizeOptions {
  out?: string;
  /** Every section from the size series rather than the stock list. */
  free: boolean;
  json: boolean;
}

/** The text of a YAML or JSON input, so the proposed file keeps its comments; null for a workbook. */
async function sourceText(input: string): Promise<string | null> {
  return ['.yaml', '.yml', '.json'].includes(extname(input).toLowerCase()) ? readFile(input, 'utf8') : null;
}

/** Lets a Ctrl-C reach the process between items (the search itself is synchronous). */
const turn = () => new Promise<void>((r) => setImmediate(r));

export async function sizeCommand(file: string, opts: SizeOptions, con: Console): Promise<number> {
  const data = loadData(con);
  if (!data) return EXIT.badInput;
  const input = resolve(con.cwd, file);
  const got = await readPreparedSpec(file, input, data, con);
  if (!got) return EXIT.badInput;
  const { raw } = got.read;
  const { spec, entries } = got.prepared;
  const run = startSizing({ raw, spec, entries, data, rules: RULES, inputs: { lp: await loadLpSolver(), ride: true }, mode: opts.free ? 'free' : 'stock' });
  con.keepPartial?.();
  const progress = startProgress({ label: 'sizing', total: run.items.length, err: (t) => con.err(t), terminal: con.errIsTerminal ?? false, json: opts.json });
  let done = 0;
  for (;;) {
    await turn();
    if (con.stop?.aborted || !run.next()) break;
    progress.step(++done);
  }
  const stopped = done < run.items.length;
  progress.finish(done, stopped);
  const result = run.result();
  const files = sizeFiles(result, { text: await sourceText(input), raw });
  const dir = resolve(con.cwd, opts.out ?? join('axletree-out', `size-${basename(file, extname(file))}`));
  const written = await writeOrRefuse(() => writeFileSet(dir, files, input), con);
  if (written === null) return EXIT.badInput;
  const text = summaryText(result, written);
  if (opts.json) {
    con.out(files.find(([n]) => n === 'size.json')![1]);
    con.err(text);
  } else con.out(text);
  return sizeFound(result) ? EXIT.ok : EXIT.failed;
}

function summaryText(r: SizeResult, written: readonly string[]): string {
  const lines = [
    `sizing ${r.spec_name} (sections from ${r.mode === 'free' ? 'the size series' : 'the stock list, else the size series'})`,
    ...(r.members.length === 0 && r.others.length === 0 ? ['nothing fails or warns among the members and no other finding fails: nothing to size'] : []),
    ...r.members.map((m) =>
      m.found
        ? `  ${m.rule}: ${m.sections.map((s) => `${s.fields.join(' × ')} ${s.from.join(' × ')} → ${s.to.join(' × ')} mm`).join('; ')} (mass ${formatQuantity(m.mass_change_kg, 'kg')})`
        : `  ${m.rule}: none found (${m.reason ?? ''})`,
    ),
    ...r.others.map((o) => (o.options.length ? `  ${o.rule} (${o.label}): ${o.options.length} option${o.options.length > 1 ? 's' : ''}, the nearest ${o.options[0].input} ${formatQuantity(o.options[0].from, o.options[0].unit)} → ${formatQuantity(o.options[0].to, o.options[0].unit)}` : `  ${o.rule} (${o.label}): no option (${o.reason ?? ''})`)),
    ...(r.complete ? [] : [`stopped: not done: ${r.not_done.join('; ')}`]),
    'written:',
    ...written.map((w) => `  ${w}`),
  ];
  return `${lines.join('\n')}\n`;
}
