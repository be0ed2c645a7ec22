import { RULES } from '../../src/core/rules/index.ts';
import { isLimitData } from '../../src/core/data/rules-data.ts';
import type { Console } from '../console.ts';
import { EXIT } from '../exit-codes.ts';
import { loadData } from '../load-data.ts';

export function rulesCommand(opts: { json: boolean }, con: Console): number {
  const data = loadData(con);
  if (!data) return EXIT.badInput;
  const list = RULES.map((r) => ({ id: r.id, title: r.title, checks: r.checks, kind: r.kind, limits: Object.hasOwn(data.limits, r.id) ? data.limits[r.id] : {} }));
  if (opts.json) {
    con.out(JSON.stringify(list, null, 2) + '\n');
    return EXIT.ok;
  }
  const text = list.map((r) => {
    const limits = Object.entries(r.limits).map(([n, l]) => {
      if (!isLimitData(l)) return `    ${n} = ${l.value} ${l.unit}\n      source: ${l.source}`;
      const levels = (['advisory', 'hard'] as const).flatMap((k) => (l[k] ? [`      ${k} ${l[k].value} ${l.unit}; source: ${l[k].source}`] : []));
      return [`    ${n}:`, ...levels].join('\n');
    });
    return [`${r.id}  ${r.title}`, `    ${r.checks}`, ...limits].join('\n');
  });
  con.out(text.join('\n\n') + '\n');
  return EXIT.ok;
}
