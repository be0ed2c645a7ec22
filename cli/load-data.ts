import type { RulesData } from '../src/core/data/rules-data.ts';
import { defaultRulesDir } from '../src/node/load-rules-data.ts';
import { loadRulesDataFast } from '../src/node/rules-data-snapshot.ts';
import { RulesDataError } from '../src/core/data/rules-data-error.ts';
import type { Console } from './console.ts';

/** The rules data, or undefined after reporting what is wrong with it. */
export function loadData(con: Console): RulesData | undefined {
  try {
    return loadRulesDataFast(con.rulesDir ?? defaultRulesDir());
  } catch (e) {
    if (!(e instanceof RulesDataError)) throw e;
    con.err(`axletree: the rules data cannot be used: ${e.message}\n`);
    return undefined;
  }
}
