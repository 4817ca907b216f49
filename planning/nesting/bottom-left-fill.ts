import type { LayoutState } from './layout-state';

interface Candidate {
  x: number;
  y: number;
}

/** Candidate origins for variant vi: strip corners plus the vertices of the NFPs of placed items. */
function candidatesFor(layout: LayoutState, vi: number): Candidate[] {
  const [x0] = layout.xRange(vi);
  const [y0, y1] = layout.yRange(vi);
  const out: Candidate[] = [{ x: x0, y: y0 }, { x: x0, y: y1 }];
  for (let j = 0; j < layout.n; j++) {
    if (!layout.placed[j]) continue;
    const nfp = layout.model.nfps.get(layout.v[j], vi);
    const c = nfp.coords;
    for (let k = 0; k < c.length; k += 2) {
      const x = c[k] + layout.x[j];
      const y = c[k + 1] + layout.y[j];
      if (x < x0) continue;
      if (y >= y0 && y <= y1) out.push({ x, y });
      // The strip edges cut NFP edges too; a vertex just outside projects onto the edge.
      else if (y < y0 && y > y0 - (y1 - y0)) out.push({ x, y: y0 });
      else if (y > y1 && y < y1 + (y1 - y0)) out.push({ x, y: y1 });
    }
  }
  out.sort((a, b) => a.x - b.x || a.y - b.y);
  return out;
}

/**
 * Constructive start: items by decreasing area (ties by input order), each at the leftmost, then
 * lowest, overlap-free position over its allowed variants, searched among NFP vertices (the
 * classic bottom-left rule on no-fit polygons; Oliveira, Gomes & Ferreira 2000 use the same idea).
 * The strip is open-ended during construction.
 */
export function placeBottomLeft(layout: LayoutState): void {
  const items = layout.model.items;
  const order = items.map((_, i) => i).sort((a, b) => items[b].area - items[a].area || a - b);
  layout.length = Infinity;
  for (const i of order) {
    let best: { v: number; x: number; y: number } | null = null;
    for (const vi of items[i].variants) {
      for (const c of candidatesFor(layout, vi)) {
        if (best && (c.x > best.x || (c.x === best.x && c.y >= best.y))) break;
        if (layout.evaluate(i, vi, c.x, c.y, 0) === 0) {
          best = { v: vi, x: c.x, y: c.y };
          break;
        }
      }
    }
    // An open strip always has room to the right of everything; this only guards odd NFPs.
    if (!best) {
      const vi = items[i].variants[0];
      best = { v: vi, x: layout.usedLength() + layout.xRange(vi)[0] + 1, y: layout.yRange(vi)[0] };
    }
    layout.place(i, best.v, best.x, best.y);
  }
}
