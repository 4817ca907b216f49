import { mm } from '@shared/units/units';
import type { Polygon } from '@shared/geometry/types';
import type { NestingInput, NestingPlacement } from '../types';

/** A published layout stored in an ESICUP nesting XML file (`<solutions><solution>`). */
export interface EsicupSolution {
  algorithm: string;
  length: number;
  placements: NestingPlacement[];
}

/** An ESICUP instance (format 3 of ../shared/datasets/nesting/README.md) as engine input. */
export interface EsicupInstance {
  input: NestingInput;
  solutions: EsicupSolution[];
}

const attr = (tag: string, name: string): string => {
  const m = new RegExp(`\\b${name}="([^"]*)"`).exec(tag);
  if (!m) throw new Error(`missing ${name} in ${tag.slice(0, 80)}`);
  return m[1];
};

function parsePolygons(xml: string): Map<string, Polygon> {
  const out = new Map<string, Polygon>();
  for (const m of xml.matchAll(/<polygon id="([^"]+)"[^>]*>([\s\S]*?)<\/polygon>/g)) {
    const ring = [...m[2].matchAll(/<segment [^>]*\/>/g)].map((s) => ({ x: Number(attr(s[0], 'x0')), y: Number(attr(s[0], 'y0')) }));
    out.set(m[1], ring);
  }
  return out;
}

/**
 * Parse an ESICUP XML instance text (no I/O: the caller reads the file). Coordinates are taken as
 * stored (y down, clockwise); placements follow the README convention: rotate the piece polygon
 * about its own origin by `angle`, then translate by (x, y). Each solution's copies are numbered
 * in file order per piece. Mirrored placements are not supported (none in the files used here).
 */
export function parseEsicupXml(xml: string): EsicupInstance {
  const polygons = parsePolygons(xml);
  const boards = /<boards>([\s\S]*?)<\/boards>/.exec(xml)![1];
  const board = polygons.get(attr(/<component [^>]*>/.exec(boards)![0], 'idPolygon'))!;
  const width = Math.max(...board.map((p) => p.y)) - Math.min(...board.map((p) => p.y));
  const lot = /<lot>([\s\S]*?)<\/lot>/.exec(xml)![1];
  const pieces = [...lot.matchAll(/<piece ([^>]*)>([\s\S]*?)<\/piece>/g)].map((m) => {
    const comp = /<component [^>]*>/.exec(m[2])![0];
    const ring = polygons.get(attr(comp, 'idPolygon'))!;
    const dx = Number(attr(comp, 'xOffset'));
    const dy = Number(attr(comp, 'yOffset'));
    return {
      id: attr(m[1], 'id'),
      quantity: Number(attr(m[1], 'quantity')),
      orientations: [...m[2].matchAll(/<enumeration angle="([^"]+)"/g)].map((a) => Number(a[1])),
      polygon: ring.map((p) => ({ x: p.x + dx, y: p.y + dy })),
    };
  });
  const solutions = [...xml.matchAll(/<solution>([\s\S]*?)<\/solution>/g)].map((m) => {
    const copies = new Map<string, number>();
    const placements = [...m[1].matchAll(/<placement [^>]*\/>/g)].map((p) => {
      const id = attr(p[0], 'idPiece');
      const copy = copies.get(id) ?? 0;
      copies.set(id, copy + 1);
      return { pieceId: id, copy, rotation: Number(attr(p[0], 'angle')), mirrored: attr(p[0], 'mirror') !== 'none', x: mm(Number(attr(p[0], 'x'))), y: mm(Number(attr(p[0], 'y'))) };
    });
    return {
      algorithm: /<Algorithm>([^<]*)</.exec(m[1])?.[1] ?? '',
      length: Number(/<solutionWidth>([^<]*)</.exec(m[1])?.[1]),
      placements,
    };
  });
  return { input: { stripWidth: mm(width), pieces }, solutions };
}
