// The check thread run from the TypeScript source: tsx is registered on this
// thread first (on Node 20 a worker's --import does not reach its own entry
// module, and the main thread's registration does not reach a worker).
import { register } from 'tsx/esm/api';

register();
await import('./check-worker.ts');
