import { OutputIsInputError } from '../src/node/atomic-write.ts';
import type { Console } from './console.ts';

/**
 * Run a write of output files; if it would write over the input, say so and
 * return null (the caller exits with bad input). Other errors are real faults.
 */
export async function writeOrRefuse(write: () => Promise<string[]>, con: Console): Promise<string[] | null> {
  try {
    return await write();
  } catch (e) {
    if (!(e instanceof OutputIsInputError)) throw e;
    con.err(`axletree: ${e.message}; choose another --out directory.\n`);
    return null;
  }
}
