import { RULES } from '../../src/core/engine/registry.ts';
import { EXIT, type Console } from '../console.ts';
import { loadData } from '../load-data.ts';

export function rulesCommand(opts: { json: boolean }, con: Console): number {
  const data = loadData(con);
  if (!data) return EXIT.badInput;
  const list = RULES.map((r) => ({ id: r.id, title: r.title, checks: r.checks, limits: Object.fromEntries(r.limits.map((n) => [n, data.limits[r.id]?.[n]])) }));
  if (opts.json) {
    con.out(JSON.stringify(list, null, 2) + '\n');
    return EXIT.ok;
  }
  const text = list.map((r) => {
    const limits = Object.entries(r.limits).map(([n, l]) => (l ? `    ${n} = ${l.value} ${l.unit}\n      source: ${l.source}` : `    ${n}: MISSING from rules/limits`));
    return [`${r.id}  ${r.title}`, `    ${r.checks}`, ...limits].join('\n');
  });
  con.out(text.join('\n\n') + '\n');
  return EXIT.ok;
}
