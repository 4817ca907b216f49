export * from './imported-pattern';
export { readDxfPattern, bulgePolyline, flattenSpline } from './dxf-pattern';
export { readSvgPattern, flattenPathData, arcToPoints, parseTransform } from './svg-pattern';
import type { ImportedPiece, PatternImportResult, PatternReadOptions } from './imported-pattern';
import { readDxfPattern } from './dxf-pattern';
import { readSvgPattern } from './svg-pattern';

/** Read a DXF or SVG pattern file, chosen by its content (an `<svg` element, else DXF group codes). */
export function readPatternFile(text: string, options: PatternReadOptions = {}): PatternImportResult {
  return /<svg[\s>]/i.test(text.slice(0, 4096)) ? readSvgPattern(text, options) : readDxfPattern(text, options);
}

const r3 = (v: number) => Math.round(v * 1000) / 1000;
const xy = (p: { x: number; y: number }): [number, number] => [r3(p.x), r3(p.y)];

/** An imported piece as plain JSON (mm to 0.001, y up): what the command prints and the preview answers. */
export function importedPieceJson(p: ImportedPiece) {
  return {
    name: p.name,
    ...(p.size ? { size: p.size } : {}),
    ...(p.quantity ? { quantity: p.quantity } : {}),
    ...(p.material ? { material: p.material } : {}),
    outline: p.outline.map(xy),
    ...(p.grainLine ? { grainLine: { from: xy(p.grainLine.from), to: xy(p.grainLine.to) } } : {}),
    ...(p.notches?.length ? { notches: p.notches.map(xy) } : {}),
    ...(p.drillHoles?.length ? { drillHoles: p.drillHoles.map(xy) } : {}),
    areaMm2: r3(p.areaMm2),
    perimeterMm: r3(p.perimeterMm),
  };
}
