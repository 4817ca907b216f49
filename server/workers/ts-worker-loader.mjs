// Worker entry that works the same under tsx (npm start), vitest and the e2e server: Node 20 workers
// do not inherit the parent's TypeScript loader, so load the entry named in workerData.entry through
// tsx's API (tsconfig paths included), then hand over to it.
import { workerData } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

await tsImport(workerData.entry, import.meta.url);
