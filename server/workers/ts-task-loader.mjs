// Piscina task file that works under tsx (npm start), vitest and the e2e server: Node 20 workers do not
// inherit the parent's TypeScript loader, so load the TypeScript entry named in workerData.entry through
// tsx's API (tsconfig paths included) and hand its default export to piscina as the task handler.
import { workerData } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

const entry = await tsImport(workerData.entry, import.meta.url);

export default entry.default;
