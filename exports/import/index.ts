export * from './imported-pattern';
export { readDxfPattern, bulgePolyline, flattenSpline } from './dxf-pattern';
export { readSvgPattern, flattenPathData, arcToPoints, parseTransform } from './svg-pattern';
import type { PatternImportResult, PatternReadOptions } from './imported-pattern';
import { readDxfPattern } from './dxf-pattern';
import { readSvgPattern } from './svg-pattern';

/** Read a DXF or SVG pattern file, chosen by its content (an `<svg` element, else DXF group codes). */
export function readPatternFile(text: string, options: PatternReadOptions = {}): PatternImportResult {
  return /<svg[\s>]/i.test(text.slice(0, 4096)) ? readSvgPattern(text, options) : readDxfPattern(text, options);
}
