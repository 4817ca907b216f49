import type { DataSource } from 'typeorm';
import type { EaseSpec, GradeRule, Piece, PointOfMeasure, SizeChart } from '@grading';
import { GradingSetEntity } from '../../entities';

/** A style's grading data as stored: base-size pieces (sewing lines, mm), rules per piece id, eases per point. */
export interface StoredGradingSet {
  id: number;
  styleId: number;
  sizeChart: SizeChart;
  pieces: Piece[];
  gradeRules: Record<string, GradeRule[]>;
  eases: Partial<Record<PointOfMeasure, EaseSpec>>;
  updatedAt: Date;
}

export type GradingSetRepository = ReturnType<typeof createGradingSetRepository>;

const toStored = (e: GradingSetEntity): StoredGradingSet => ({
  id: e.id,
  styleId: e.styleId,
  sizeChart: e.sizeChart as SizeChart,
  pieces: (e.pieces ?? []) as Piece[],
  gradeRules: (e.gradeRules ?? {}) as Record<string, GradeRule[]>,
  eases: (e.eases ?? {}) as Partial<Record<PointOfMeasure, EaseSpec>>,
  updatedAt: e.updatedAt,
});

/** Grading-set queries, always scoped to one studio; one set per style. */
export function createGradingSetRepository(ds: DataSource) {
  const repo = ds.getRepository(GradingSetEntity);
  return {
    async byStyle(studioId: number, styleId: number): Promise<StoredGradingSet | null> {
      const e = await repo.findOne({ where: { studioId, styleId } });
      return e ? toStored(e) : null;
    },
    /**
     * Replace the pieces of a style's stored set in one transaction (the grade rules of the old pieces go with
     * them): either all the imported pieces are stored or none. Null when the style has no set yet.
     */
    async replacePieces(studioId: number, styleId: number, pieces: Piece[]): Promise<{ before: StoredGradingSet; after: StoredGradingSet } | null> {
      return ds.transaction(async (m) => {
        const r = m.getRepository(GradingSetEntity);
        const e = await r.findOne({ where: { studioId, styleId } });
        if (!e) return null;
        const before = toStored(e);
        e.pieces = pieces;
        e.gradeRules = {};
        return { before, after: toStored(await r.save(e)) };
      });
    },
    /** Insert or replace the parts given; returns the stored set. */
    async save(studioId: number, styleId: number, patch: Partial<Omit<StoredGradingSet, 'id' | 'styleId' | 'updatedAt'>>): Promise<StoredGradingSet> {
      const existing = await repo.findOne({ where: { studioId, styleId } });
      const e = existing ?? repo.create({ studioId, styleId, sizeChart: null, pieces: [], gradeRules: {}, eases: {} });
      if (patch.sizeChart !== undefined) e.sizeChart = patch.sizeChart;
      if (patch.pieces !== undefined) e.pieces = patch.pieces;
      if (patch.gradeRules !== undefined) e.gradeRules = patch.gradeRules;
      if (patch.eases !== undefined) e.eases = patch.eases;
      return toStored(await repo.save(e));
    },
  };
}
