/* global process, URL, console */
// `npm start`. With NODE_ENV=production it runs the build (`npm run build`) with plain Node and
// production dependencies only; it never builds. Otherwise (a laptop, `npm install && npm start`) it runs
// the TypeScript sources through tsx, which builds the client first when it is missing or stale.
import { existsSync } from 'node:fs';

const entry = process.argv[2] ?? 'start';
const production = process.env.NODE_ENV === 'production';
const file = new URL(production ? `../dist/server/${entry}.js` : `./${entry}.ts`, import.meta.url);
// The entry sees itself as the script Node ran (argv[1]) with its own arguments after it.
process.argv.splice(1, 2, decodeURIComponent(file.pathname));
if (production) {
  if (!existsSync(file) || !existsSync(new URL('../dist/client/index.html', import.meta.url))) {
    console.error('No production build found: run `npm run build` (with development dependencies installed) first.');
    process.exit(1);
  }
  await import(file.href);
} else {
  const { tsImport } = await import('tsx/esm/api');
  await tsImport(file.href, import.meta.url);
}
