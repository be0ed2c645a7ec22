// Where the check thread's code is. Plain JavaScript, so that the bundler
// keeps this module's own address: from the TypeScript source it is beside
// check-worker-source.mjs, which registers tsx and runs check-worker.ts; in
// the bundle it is a chunk of the bundle, beside the bundled worker
// (review-worker.mjs, an entry point of scripts/bundle.ts).

const here = import.meta.url;
const FROM_SOURCE = here.endsWith('/src/node/review/worker-place.mjs');

/** The check thread's entry module. */
export function checkWorkerUrl() {
  return new URL(FROM_SOURCE ? './check-worker-source.mjs' : './review-worker.mjs', here);
}
