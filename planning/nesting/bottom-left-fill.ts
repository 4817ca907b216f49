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
 * Fast fallback for `items` (unplaced): bounding-box columns of the packed shapes, to the right of
 * every placed shape, each column filled from y = 0 upwards; a column is as wide as its widest shape.
 * Packed-shape boxes never overlap, so the result keeps the gap. Each item takes its variant of least
 * packed height. Linear in the items and NFP-free.
 */
export function placeShelves(layout: LayoutState, items: number[]): void {
  const { model } = layout;
  let colX = 0;
  for (let j = 0; j < layout.n; j++) if (layout.placed[j]) colX = Math.max(colX, layout.x[j] + model.variants[layout.v[j]].sMaxX);
  let colRight = colX;
  let cursorY = 0;
  let inColumn = 0;
  for (const i of items) {
    const vi = model.items[i].variants.reduce((a, b) => {
      const va = model.variants[a], vb = model.variants[b];
      return vb.sMaxY - vb.sMinY < va.sMaxY - va.sMinY ? b : a;
    });
    const s = model.variants[vi];
    let y = Math.max(cursorY - s.sMinY, -s.minY);
    if (inColumn > 0 && y + s.maxY > model.width) {
      colX = colRight;
      cursorY = 0;
      inColumn = 0;
      y = -s.minY;
    }
    const x = Math.max(colX - s.sMinX, -s.minX);
    layout.place(i, vi, x, y);
    colRight = Math.max(colRight, x + s.sMaxX);
    cursorY = y + s.sMaxY;
    inColumn++;
  }
}

/**
 * Constructive start: items by decreasing area (ties by input order), each at the leftmost, then
 * lowest, overlap-free position over its allowed variants, searched among NFP vertices (the
 * classic bottom-left rule on no-fit polygons; Oliveira, Gomes & Ferreira 2000 use the same idea).
 * The strip is open-ended during construction. `stop` is polled before each item and each variant
 * (time budget, abort signal); once it answers true the remaining items go to `placeShelves`, and
 * the function returns false (true when every item was placed bottom-left).
 */
export function placeBottomLeft(layout: LayoutState, stop: () => boolean = () => false): boolean {
  const items = layout.model.items;
  const order = items.map((_, i) => i).sort((a, b) => items[b].area - items[a].area || a - b);
  layout.length = Infinity;
  for (let k = 0; k < order.length; k++) {
    const i = order[k];
    let best: { v: number; x: number; y: number } | null = null;
    let stopped = false;
    for (const vi of items[i].variants) {
      if (stop()) {
        stopped = true;
        break;
      }
      for (const c of candidatesFor(layout, vi)) {
        if (best && (c.x > best.x || (c.x === best.x && c.y >= best.y))) break;
        if (layout.evaluate(i, vi, c.x, c.y, 0) === 0) {
          best = { v: vi, x: c.x, y: c.y };
          break;
        }
      }
    }
    if (best) layout.place(i, best.v, best.x, best.y);
    // An open strip always has room to the right of everything; the shelves also guard odd NFPs.
    else if (!stopped) placeShelves(layout, [i]);
    if (stopped || stop()) {
      placeShelves(layout, order.slice(best ? k + 1 : k));
      return false;
    }
  }
  return true;
}
