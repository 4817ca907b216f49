import Drawing from 'dxf-writer';
import DxfParser from 'dxf-parser';
import { polygonSignedArea } from '@shared/geometry/polygon';
import { polygonContainsPoint } from '@shared/geometry/polyline';
import type { Point, Polygon } from '@shared/geometry/types';
import type { GradedPiece, InternalLine, Piece } from '@grading';

/** DXF layer names used by the piece exporter and importer. */
export const DXF_LAYERS = { sewing: 'SEWING', cutting: 'CUTTING', grain: 'GRAIN', notch: 'NOTCH', drill: 'DRILL', internal: 'INTERNAL', label: 'LABEL' } as const;

/** Options for {@link pieceToDxf}. `cutting` supplies each piece's cutting line (e.g. grading's cuttingOutline). */
export interface PieceDxfOptions {
  cutting?: (piece: Piece) => Polygon;
  /** Gap between pieces laid side by side along x (mm). Default 50. */
  gapMm?: number;
}

/**
 * DXF (millimetre units, $INSUNITS = 4) of pieces or a graded set, written with dxf-writer. Each piece is a
 * closed LWPOLYLINE on SEWING (and CUTTING if given), grain line as a LINE on GRAIN, notches as 5 mm LINEs on
 * NOTCH, drill holes as 1.5 mm CIRCLEs on DRILL, internal lines as open LWPOLYLINEs on INTERNAL, and a TEXT
 * label "<name>|<id>|<size>|<cut>|<quantity>" on LABEL inside the piece. Separate pieces are laid out left to
 * right with `gapMm` between them; sizes of a graded set stay nested in place.
 */
export function pieceToDxf(subject: Piece | Piece[] | GradedPiece, options: PieceDxfOptions = {}): string {
  const d = new Drawing();
  d.setUnits('Millimeters');
  const colors = [Drawing.ACI.RED, Drawing.ACI.WHITE, Drawing.ACI.GREEN, Drawing.ACI.YELLOW, Drawing.ACI.CYAN, Drawing.ACI.BLUE, Drawing.ACI.MAGENTA];
  Object.values(DXF_LAYERS).forEach((name, i) => d.addLayer(name, colors[i], 'CONTINUOUS'));
  const items = 'bySize' in subject ? subject.sizes.map((s) => ({ piece: subject.bySize[s], size: s, dx: 0 }))
    : layout(Array.isArray(subject) ? subject : [subject], options.gapMm ?? 50);
  for (const { piece, size, dx } of items) writePiece(d, piece, size, dx, options);
  return d.toDxfString();
}

function layout(pieces: Piece[], gap: number) {
  let x = 0;
  return pieces.map((piece) => {
    const xs = piece.outline.map((p) => p.x);
    const dx = x - Math.min(...xs);
    x += Math.max(...xs) - Math.min(...xs) + gap;
    return { piece, size: '', dx };
  });
}

function writePiece(d: Drawing, piece: Piece, size: string, dx: number, o: PieceDxfOptions): void {
  const P = (p: Point): [number, number] => [p.x + dx, p.y];
  d.setActiveLayer(DXF_LAYERS.sewing).drawPolyline(piece.outline.map(P), true);
  const cut = o.cutting?.(piece) ?? [];
  if (cut.length) d.setActiveLayer(DXF_LAYERS.cutting).drawPolyline(cut.map(P), true);
  const g = piece.grainLine;
  d.setActiveLayer(DXF_LAYERS.grain).drawLine(...P(g.from), ...P(g.to));
  d.setActiveLayer(DXF_LAYERS.notch);
  const n = piece.outline.length;
  for (const i of piece.notches) {
    const a = piece.outline[(i - 1 + n) % n], b = piece.outline[(i + 1) % n], p = piece.outline[i];
    const l = Math.hypot(b.x - a.x, b.y - a.y) || 1;
    d.drawLine(...P(p), ...P({ x: p.x + ((b.y - a.y) / l) * 5, y: p.y - ((b.x - a.x) / l) * 5 }));
  }
  d.setActiveLayer(DXF_LAYERS.drill);
  for (const h of piece.drillHoles) d.drawCircle(...P(h), 1.5);
  d.setActiveLayer(DXF_LAYERS.internal);
  for (const line of piece.internalLines) if (line.points.length > 1) d.drawPolyline(line.points.map(P), false);
  const mid = { x: (g.from.x + g.to.x) / 2, y: (g.from.y + g.to.y) / 2 };
  d.setActiveLayer(DXF_LAYERS.label).drawText(...P(mid), 5, 0, [piece.name, piece.id, size, piece.cut, piece.quantity].join('|'));
}

interface DxfEntity {
  type: string;
  layer?: string;
  vertices?: { x: number; y: number }[];
  shape?: boolean;
  center?: { x: number; y: number };
  startPoint?: { x: number; y: number };
  text?: string;
}

/**
 * Read pieces back from DXF text (dxf-parser): every closed LWPOLYLINE/POLYLINE on SEWING is a piece; GRAIN
 * lines, DRILL circles, INTERNAL polylines and LABEL texts are given to the piece that contains them. Outlines
 * come back counter-clockwise with one edge 'outline' (allowance `seamAllowanceMm`, default 10). Returns [] for
 * text without sewing lines; throws on malformed DXF.
 */
export function dxfToPieces(text: string, seamAllowanceMm = 10): Piece[] {
  const parsed = new DxfParser().parseSync(text) as { entities: DxfEntity[] } | null;
  const entities = parsed?.entities ?? [];
  const on = (layer: string) => entities.filter((e) => e.layer === layer);
  const isPoly = (e: DxfEntity) => e.type === 'LWPOLYLINE' || e.type === 'POLYLINE';
  const outlines = on(DXF_LAYERS.sewing).filter((e) => isPoly(e) && e.shape && (e.vertices?.length ?? 0) >= 3);
  const labels = on(DXF_LAYERS.label);
  return outlines.map((e, k) => {
    let outline = e.vertices!.map((v) => ({ x: v.x, y: v.y }));
    if (polygonSignedArea(outline) < 0) outline = outline.reverse();
    const inside = (p?: { x: number; y: number }) => !!p && polygonContainsPoint(outline, p);
    // Labels are written in outline order; fall back to the label inside the outline for foreign files.
    const own = labels.length === outlines.length ? labels[k] : labels.find((t) => inside(t.startPoint));
    const label = own?.text?.split('|') ?? [];
    const grain = on(DXF_LAYERS.grain).find((l) => inside(l.vertices?.[0]));
    const internalLines: InternalLine[] = on(DXF_LAYERS.internal).filter((l) => isPoly(l) && inside(l.vertices?.[0]))
      .map((l, i) => ({ kind: 'reference', name: `line-${i}`, points: l.vertices!.map((v) => ({ x: v.x, y: v.y })) }));
    const cut = label[3] === 'pair' || label[3] === 'fold' ? label[3] : 'cut1';
    return {
      id: label[1] || `piece-${k + 1}`, name: label[0] || `Piece ${k + 1}`, role: 'imported', outline,
      edges: [{ name: 'outline', from: 0, to: 0, allowanceMm: seamAllowanceMm }],
      grainLine: grain?.vertices ? { from: { x: grain.vertices[0].x, y: grain.vertices[0].y }, to: { x: grain.vertices[1].x, y: grain.vertices[1].y } } : { from: outline[0], to: outline[1] },
      notches: [], drillHoles: on(DXF_LAYERS.drill).filter((c) => inside(c.center)).map((c) => ({ x: c.center!.x, y: c.center!.y })),
      internalLines, cut, quantity: Number(label[4]) || 1, landmarks: {}, curveToleranceMm: 0.25,
    } satisfies Piece;
  });
}
