import { readFileSync } from 'node:fs';
import path from 'node:path';
import { mm } from '@shared/units/units';
import type { NestingInput } from '../../../planning/nesting';

/** An instance file of ../shared/datasets/nesting/json (jagua-rs / sparrow format, see its README). */
export interface JsonInstance {
  name: string;
  strip_height: number;
  items: { id: number; demand: number; allowed_orientations?: number[]; shape: { type: string; data: [number, number][] } }[];
}

export function readJsonInstance(file: string): JsonInstance {
  return JSON.parse(readFileSync(file, 'utf8')) as JsonInstance;
}

/** Engine input: one piece per item type, id = the item id as a string, no mirroring, no gap. */
export function instanceToInput(inst: JsonInstance): NestingInput {
  return {
    stripWidth: mm(inst.strip_height),
    pieces: inst.items.map((it) => ({
      id: String(it.id),
      polygon: it.shape.data.map(([x, y]) => ({ x, y })),
      quantity: it.demand,
      orientations: it.allowed_orientations ?? [0, 90, 180, 270],
    })),
  };
}

/** ../shared/datasets/nesting/json, found from this file upwards (repo layout: /work/main + /work/shared). */
export function datasetDir(...parts: string[]): string {
  let dir = path.dirname(new URL(import.meta.url).pathname);
  for (let k = 0; k < 8; k++) {
    const cand = path.join(dir, 'shared', 'datasets', 'nesting');
    try {
      readFileSync(path.join(cand, 'README.md'));
      return path.join(cand, ...parts);
    } catch {
      dir = path.dirname(dir);
    }
  }
  throw new Error('shared/datasets/nesting not found above ' + import.meta.url);
}
