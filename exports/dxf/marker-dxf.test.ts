import DxfParser from 'dxf-parser';
import { describe, expect, it } from 'vitest';
import { MARKER_DXF_LAYERS, markerToDxf } from './marker-dxf';

interface Entity { type: string; layer: string; vertices?: { x: number; y: number }[]; shape?: boolean; text?: string }
const parse = (text: string) => new DxfParser().parseSync(text) as unknown as { header: Record<string, unknown>; entities: Entity[] };

// A 100 × 50 mm rectangle, placed twice: as drafted at (20, 0), and turned half a turn at (300, 60).
const RECT = [{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 100, y: 50 }, { x: 0, y: 50 }];
const input = {
  outlines: { 'M:front': RECT },
  placements: [
    { pieceKey: 'M:front', size: 'M', pieceName: 'Front', rotation: 0, mirrored: false, x: 20, y: 0 },
    { pieceKey: 'M:front', size: 'M', pieceName: 'Front', rotation: 180, mirrored: false, x: 300, y: 60 },
  ],
  lengthMm: 420,
  widthMm: 1450,
  title: 'B-0002 · ND-01 · M2 · 420 × 1450 mm',
};

describe('markerToDxf', () => {
  it('writes millimetres ($INSUNITS 4) that an independent reader (dxf-parser) opens', () => {
    expect(parse(markerToDxf(input)).header.$INSUNITS).toBe(4);
  });

  it('draws the fabric edge as length × cuttable width and one closed cutting line per placed copy', () => {
    const entities = parse(markerToDxf(input)).entities;
    const edge = entities.filter((e) => e.layer === MARKER_DXF_LAYERS.border);
    expect(edge).toHaveLength(1);
    expect(edge[0].vertices!.map((v) => [v.x, v.y])).toEqual([[0, 0], [420, 0], [420, 1450], [0, 1450]]);
    const cuts = entities.filter((e) => e.layer === MARKER_DXF_LAYERS.cut);
    expect(cuts).toHaveLength(2);
    expect(cuts.every((c) => c.shape)).toBe(true);
    // Worked by hand: as drafted, moved 20 mm along the length.
    expect(cuts[0].vertices!.map((v) => [v.x, v.y])).toEqual([[20, 0], [120, 0], [120, 50], [20, 50]]);
    // Worked by hand: (x, y) → (−x, −y) for the half turn, then moved to (300, 60).
    expect(cuts[1].vertices!.map((v) => [Math.round(v.x * 1e6) / 1e6, Math.round(v.y * 1e6) / 1e6])).toEqual([[300, 60], [200, 60], [200, 10], [300, 10]]);
  });

  it('labels each copy with its size and piece name and draws its grain along the fabric length', () => {
    const entities = parse(markerToDxf(input)).entities;
    const labels = entities.filter((e) => e.layer === MARKER_DXF_LAYERS.label).map((e) => e.text);
    expect(labels).toContain('M Front');
    expect(labels.filter((t) => t === 'M Front')).toHaveLength(2);
    const grain = entities.filter((e) => e.layer === MARKER_DXF_LAYERS.grain) as (Entity & { vertices: { x: number; y: number }[] })[];
    expect(grain).toHaveLength(2);
    for (const g of grain) expect(g.vertices[0].y).toBeCloseTo(g.vertices[1].y, 9);
  });
});
