import { FloorTestError } from '../../src/core/floor-test/floor-test-types.ts';

/** The message code a floor-test estimate is refused with, or undefined where it is not; any other fault is rethrown. */
export function refusalCode(f: () => unknown): number | undefined {
  try {
    f();
  } catch (e) {
    if (e instanceof FloorTestError) return e.code;
    throw e;
  }
  return undefined;
}
