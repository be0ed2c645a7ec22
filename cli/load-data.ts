import type { RulesData } from '../src/core/data/rules-data.ts';
import { defaultRulesDir, loadRulesData } from '../src/node/load-rules-data.ts';
import { RulesDataError } from '../src/core/data/rules-data-error.ts';
import type { Console } from './console.ts';

/** The rules data, or undefined after reporting what is wrong with it. */
export function loadData(con: Console): RulesData | undefined {
  try {
    return loadRulesData(con.rulesDir ?? defaultRulesDir());
  } catch (e) {
    if (!(e instanceof RulesDataError)) throw e;
    con.err(`axletree: the rules data cannot be used: ${e.message}\n`);
    return undefined;
  }
}
