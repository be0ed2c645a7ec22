// Starts a worker thread written in TypeScript, from the source: tsx is
// registered in this thread first, then the entry named in workerData is
// loaded. (The bundle's workers are JavaScript and start without this.)
import { workerData } from 'node:worker_threads';
import { register } from 'tsx/esm/api';

register();
await import(workerData.entry);
