// Node 20 workers do not inherit tsx's loader from the parent: load the TypeScript entry named in
// workerData.entry through tsx's API (tsconfig paths included), then hand over to it.
import { workerData } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

await tsImport(workerData.entry, import.meta.url);
