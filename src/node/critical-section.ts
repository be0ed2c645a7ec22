// Work that must not be cut in half by Ctrl-C: the renames that swap a new
// output set into place. The process's signal handler (cli/main.ts, the only
// place that touches the process) asks to stop through whenSafe; a stop asked
// for inside a section waits for its end.

let depth = 0;
let pending: (() => void) | null = null;

export async function critical<T>(work: () => Promise<T>): Promise<T> {
  depth++;
  try {
    return await work();
  } finally {
    depth--;
    if (depth === 0 && pending) {
      const stop = pending;
      pending = null;
      stop();
    }
  }
}

/** Run stop now, or as soon as no critical section is open. */
export function whenSafe(stop: () => void): void {
  if (depth === 0) stop();
  else pending = stop;
}
