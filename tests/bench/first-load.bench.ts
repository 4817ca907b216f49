/**
 * The JavaScript a phone fetches before its first screen: the built entry chunk plus every chunk it
 * imports statically (Vite modulepreloads those), each gzipped at level 9. Reads the Vite manifest of
 * `vite build` (build.manifest is on) and prints one JSON line. `npm run bench:first-load` builds first.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import { gzipSync } from 'node:zlib';

/** The budget from issue 21: at most 200 kB (200 000 bytes, as Vite counts kB) gzipped. */
export const FIRST_LOAD_BUDGET_GZIP_BYTES = 200_000;

interface ManifestChunk {
  file: string;
  isEntry?: boolean;
  imports?: string[];
  dynamicImports?: string[];
}

export interface FirstLoad {
  entry: string;
  /** Manifest keys (source modules) of the chunks in the first load, and of those left for later. */
  chunks: string[];
  laterChunks: string[];
  files: { file: string; bytes: number; gzipBytes: number }[];
  bytes: number;
  gzipBytes: number;
  budgetGzipBytes: number;
}

export function measureFirstLoad(outDir = 'dist/client'): FirstLoad {
  const manifest = JSON.parse(readFileSync(join(outDir, '.vite/manifest.json'), 'utf8')) as Record<string, ManifestChunk>;
  const entryKey = Object.keys(manifest).find((k) => manifest[k].isEntry);
  if (!entryKey) throw new Error(`No entry chunk in ${outDir}/.vite/manifest.json`);
  const seen = new Set<string>();
  const visit = (key: string) => {
    if (seen.has(key)) return;
    seen.add(key);
    for (const k of manifest[key].imports ?? []) visit(k);
  };
  visit(entryKey);
  const files = [...seen]
    .map((k) => manifest[k].file)
    .filter((f) => f.endsWith('.js'))
    .map((file) => {
      const bytes = readFileSync(join(outDir, file));
      return { file, bytes: bytes.length, gzipBytes: gzipSync(bytes, { level: 9 }).length };
    });
  return {
    entry: manifest[entryKey].file,
    chunks: [...seen],
    laterChunks: Object.keys(manifest).filter((k) => !seen.has(k) && manifest[k].file.endsWith('.js')),
    files,
    bytes: files.reduce((s, f) => s + f.bytes, 0),
    gzipBytes: files.reduce((s, f) => s + f.gzipBytes, 0),
    budgetGzipBytes: FIRST_LOAD_BUDGET_GZIP_BYTES,
  };
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  const r = measureFirstLoad(process.argv[2]);
  const { chunks: _c, laterChunks: _l, ...figures } = r;
  console.log(JSON.stringify({ ...figures, gzipKb: Math.round(r.gzipBytes / 100) / 10, withinBudget: r.gzipBytes <= r.budgetGzipBytes }));
  if (r.gzipBytes > r.budgetGzipBytes) process.exitCode = 1;
}
