/**
 * The repository's import graph, read with the TypeScript compiler's own resolver (type-only imports
 * included: a circle of types is still a circle a reader has to follow).
 */
import { readFileSync, readdirSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import ts from 'typescript';

const ROOT = join(import.meta.dirname, '..', '..');
const FOLDERS = ['src', 'server', 'shared', 'grading', 'planning', 'exports'];

function sourceFiles(dir: string): string[] {
  const out: string[] = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...sourceFiles(path));
    else if (/\.tsx?$/.test(name) && !/\.d\.ts$/.test(name) && !/\.test\.tsx?$/.test(name)) out.push(path);
  }
  return out;
}

export function importGraph(): Map<string, string[]> {
  const config = ts.readConfigFile(join(ROOT, 'tsconfig.json'), ts.sys.readFile).config;
  const options = ts.parseJsonConfigFileContent(config, ts.sys, ROOT).options;
  const graph = new Map<string, string[]>();
  for (const folder of FOLDERS) {
    for (const file of sourceFiles(join(ROOT, folder))) {
      const info = ts.preProcessFile(readFileSync(file, 'utf8'), true, true);
      const targets: string[] = [];
      for (const ref of info.importedFiles) {
        const resolved = ts.resolveModuleName(ref.fileName, file, options, ts.sys).resolvedModule;
        if (!resolved || resolved.isExternalLibraryImport) continue;
        targets.push(relative(ROOT, resolved.resolvedFileName));
      }
      graph.set(relative(ROOT, file), targets);
    }
  }
  return graph;
}

/** Strongly connected components with more than one file, or a file that imports itself (Tarjan). */
export function importCircles(graph: Map<string, string[]>): string[][] {
  let index = 0;
  const indexOf = new Map<string, number>();
  const low = new Map<string, number>();
  const stack: string[] = [];
  const onStack = new Set<string>();
  const circles: string[][] = [];
  const visit = (v: string) => {
    indexOf.set(v, index);
    low.set(v, index++);
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!indexOf.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, indexOf.get(w)!));
    }
    if (low.get(v) === indexOf.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        component.push(w);
      } while (w !== v);
      if (component.length > 1 || (graph.get(v) ?? []).includes(v)) circles.push(component.sort());
    }
  };
  for (const v of graph.keys()) if (!indexOf.has(v)) visit(v);
  return circles;
}

/** Folder-level graph: `server/modules/cutting` → `server/modules/markers`, one level below the top folder's areas. */
export function folderOf(file: string): string {
  const parts = file.split('/');
  if (parts[0] === 'server' && parts[1] === 'modules') return parts.slice(0, 3).join('/');
  if (parts[0] === 'src' && parts[1] === 'features') return parts.slice(0, 3).join('/');
  return parts.length > 2 ? parts.slice(0, 2).join('/') : parts[0];
}
