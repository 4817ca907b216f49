import {
  cuttingOutline, demoSizeChart, draftStyle, en13402BustIntervals, gradeStyle, isPointOfMeasure, measurementsForSize,
  parseSizeChartTable, sizeChartToRows, sizeMix, type BlockSpec, type BodyMeasurements, type GradeRule, type SeamSpec, type SizeChart, type TableError,
} from '@grading';
import { pieceToDxf } from '@exports/dxf/piece-dxf';
import { pieceToSvg } from '@exports/svg/piece-svg';
import { mm } from '@shared/units/units';
import type { GradingDto, PutGradeRuleInput, PutSizeChartInput, SizeMixDto } from '../../../shared/schemas/grading';
import type { Actor } from '../../auth/require';
import { badRequest, notFound } from '../../errors';
import type { AuditRepository } from '../audit/audit.repository';
import type { StyleRepository } from '../styles/style.repository';
import { runCpuTask } from '../../jobs/cpu-pool';
import type { GradingSetRepository, StoredGradingSet } from './grading-set.repository';
import { presentChart, presentGrading } from './grading.presenter';
import { readTable, rowsToCsv, rowsToXlsx, type UploadedTable } from './table-io';
import { LISTED_ERRORS } from '../uploads/table-limits';
import type { PatternAcceptInput, PatternImportInput } from '../../../shared/schemas/grading';
import { acceptedPieces, previewPatternFile } from './pattern-import';
import type { Download } from '../../middleware/download';

export interface GradingServiceDeps {
  styles: StyleRepository;
  sets: GradingSetRepository;
  audit: AuditRepository;
  now: () => Date;
}

export type GradingService = ReturnType<typeof createGradingService>;


/** The first problems of a table as field errors; the message gives the total. */
const tableErrorFields = (errors: TableError[]) =>
  Object.fromEntries(errors.slice(0, LISTED_ERRORS).map((e) => [`row ${e.row}, column ${e.column}`, e.message]));
const problemCount = (n: number) => `${n} problem${n > 1 ? 's' : ''}${n > LISTED_ERRORS ? `, the first ${LISTED_ERRORS} listed` : ''}`;

/** The set graded over its run on the CPU pool's threads (grading and cutting outlines are CPU work), checked
 * against the style's own seams (none stored: proposed from the pieces). */
const gradeOnPool = (set: StoredGradingSet, style: { baseSize: string; composition: { seams?: unknown } | null }) =>
  runCpuTask('grading', { set: { sizeChart: set.sizeChart, pieces: set.pieces, gradeRules: set.gradeRules, seams: (style.composition?.seams as SeamSpec[] | null | undefined) ?? null }, styleBase: style.baseSize });

/** The style's base pieces drafted from its composition at the base size's chart measurements; a bad option or a
 * measurement the chart lacks is a 400 naming it. */
function draftComposition(composition: { preset: string | null; blocks: unknown[] }, chart: SizeChart, baseSize: string) {
  try {
    return draftStyle(measurementsForSize(chart, baseSize) as BodyMeasurements, { preset: composition.preset, blocks: composition.blocks as BlockSpec[] });
  } catch (err) {
    if (!(err instanceof RangeError)) throw err;
    throw badRequest(`composition: ${err.message}`, { composition: err.message });
  }
}

/** Grading rules of a style: chart, rules, graded set, downloads and the size mix. */
export function createGradingService({ styles, sets, audit, now }: GradingServiceDeps) {
  async function styleOf(actor: Actor, styleId: number) {
    const style = await styles.get(actor.studioId, styleId);
    if (!style) throw notFound('Style');
    return style;
  }
  async function setOf(actor: Actor, styleId: number): Promise<StoredGradingSet> {
    const set = await sets.byStyle(actor.studioId, styleId);
    if (!set || !set.sizeChart) throw notFound('Grading set');
    return set;
  }

  function checkChart(chart: SizeChart, run: string[]): void {
    if (chart.sizes.join('|') !== run.join('|')) {
      throw badRequest(`sizes: the chart's sizes must be the style's size run (${run.join(', ')})`, { sizes: `Use the style's size run: ${run.join(', ')}` });
    }
  }

  async function saveChart(actor: Actor, styleId: number, chart: SizeChart, eases: StoredGradingSet['eases'] | undefined, action: string) {
    const style = await styleOf(actor, styleId);
    checkChart(chart, style.sizeRun);
    const before = await sets.byStyle(actor.studioId, styleId);
    const saved = await sets.save(actor.studioId, styleId, { sizeChart: chart, ...(eases ? { eases } : {}) });
    await audit.record(actor, action, 'grading_set', saved.id, before?.sizeChart ? presentChart(before.sizeChart) : undefined, presentChart(chart));
    return get(actor, styleId);
  }

  async function get(actor: Actor, styleId: number): Promise<GradingDto> {
    const style = await styleOf(actor, styleId);
    const set = await sets.byStyle(actor.studioId, styleId);
    const computed = set?.sizeChart ? await gradeOnPool(set, style) : null;
    return presentGrading(style.id, style.sizeRun, style.baseSize, set, computed);
  }

  return {
    get,

    /** Replace the chart from the grid; unknown points of measure are field errors. */
    async putChart(actor: Actor, styleId: number, input: PutSizeChartInput) {
      const fields: Record<string, string> = {};
      input.rows.forEach((r, i) => {
        if (!isPointOfMeasure(r.pointOfMeasure)) fields[`rows.${i}.pointOfMeasure`] = 'Unknown point of measure';
      });
      for (const k of Object.keys(input.eases ?? {})) if (!isPointOfMeasure(k)) fields[`eases.${k}`] = 'Unknown point of measure';
      if (Object.keys(fields).length) throw badRequest(`${Object.keys(fields)[0]}: ${Object.values(fields)[0]}`, fields);
      const chart: SizeChart = { name: input.name, sizes: input.sizes, values: Object.fromEntries(input.rows.map((r) => [r.pointOfMeasure, r.values.map(mm)])) };
      const eases = input.eases
        ? Object.fromEntries(Object.entries(input.eases).map(([k, v]) => [k, { easeMm: mm(v.easeMm), toleranceMm: mm(v.toleranceMm) }]))
        : undefined;
      return saveChart(actor, styleId, chart, eases, 'update_chart');
    },

    /** Read a DXF or SVG pattern file into a to-scale preview; nothing is saved. */
    async previewPattern(actor: Actor, styleId: number, file: { buffer: Buffer; originalname: string } | undefined, input: PatternImportInput) {
      const style = await styleOf(actor, styleId);
      const preview = await previewPatternFile(file, input, (text, units) => runCpuTask('pattern-file', { text, units }));
      const sizes = [...new Set(preview.pieces.flatMap((p) => (p.size ? [p.size] : [])))];
      return { ...preview, baseSize: style.baseSize, sizesInFile: sizes, sizesNotInRun: sizes.filter((s) => !style.sizeRun.includes(s)) };
    },

    /** Nothing, or a 404 when the style is not the actor's studio's (for routes that read no style data). */
    async checkStyle(actor: Actor, styleId: number): Promise<void> {
      await styleOf(actor, styleId);
    },

    /** Store the accepted pieces as the style's pieces (all or none), replacing the old pieces and their rules, or beside them with `keepExisting`. */
    async acceptPattern(actor: Actor, styleId: number, input: PatternAcceptInput) {
      await styleOf(actor, styleId);
      const set = await sets.byStyle(actor.studioId, styleId);
      const kept = input.keepExisting ? set?.pieces ?? [] : [];
      const pieces = acceptedPieces(input, kept.map((p) => p.id));
      if (!set?.sizeChart) throw badRequest("sizeChart: put in the style's size chart before accepting pieces", { sizeChart: "Put in the style's size chart first (Pattern & grading)" });
      if (input.keepExisting) {
        // A traced piece joins the style's pieces; their grade rules stay.
        await sets.save(actor.studioId, styleId, { pieces: [...kept, ...pieces] });
        await audit.record(actor, 'import_pattern', 'grading_set', set.id, { pieces: kept.map((p) => p.id) }, { pieces: [...kept, ...pieces].map((p) => p.id), outlineIs: input.outlineIs });
        return get(actor, styleId);
      }
      const replaced = await sets.replacePieces(actor.studioId, styleId, pieces);
      if (!replaced) throw notFound('Grading set');
      await audit.record(actor, 'import_pattern', 'grading_set', replaced.after.id, { pieces: replaced.before.pieces.map((p) => p.id) }, { pieces: pieces.map((p) => p.id), outlineIs: input.outlineIs });
      return get(actor, styleId);
    },

    /** Import a chart from CSV or XLSX: every bad cell reported (row, column, why), nothing saved on error. */
    async importChart(actor: Actor, styleId: number, file: UploadedTable | undefined) {
      if (!file) throw badRequest('file: attach a CSV or XLSX file', { file: 'Attach a CSV or XLSX file' });
      const parsed = parseSizeChartTable(await readTable(file), file.originalname.replace(/\.(csv|xlsx)$/i, ''));
      if (!parsed.ok) {
        const first = parsed.errors[0];
        throw badRequest(`row ${first.row}, column ${first.column}: ${first.message} (${problemCount(parsed.errors.length)}; nothing imported)`, tableErrorFields(parsed.errors));
      }
      return saveChart(actor, styleId, parsed.chart, undefined, 'import_chart');
    },

    async exportChart(actor: Actor, styleId: number, format: 'csv' | 'xlsx', unit: 'mm' | 'cm' | 'in'): Promise<Download> {
      const style = await styleOf(actor, styleId);
      const set = await setOf(actor, styleId);
      const rows = sizeChartToRows(set.sizeChart, unit);
      const base = `${style.code}-size-chart`;
      if (format === 'csv') return { body: rowsToCsv(rows), type: 'text/csv; charset=utf-8', filename: `${base}.csv` };
      return { body: await rowsToXlsx(rows, 'Size chart', now()), type: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet', filename: `${base}.xlsx` };
    },

    /** Set the movement per step of one grade point (replacing the rule on the same target, or adding one). */
    async putRule(actor: Actor, styleId: number, pieceId: string, input: PutGradeRuleInput) {
      await styleOf(actor, styleId);
      const set = await setOf(actor, styleId);
      const piece = set.pieces.find((p) => p.id === pieceId);
      if (!piece) throw notFound('Piece');
      const steps = set.sizeChart.sizes.length - 1;
      if (input.steps.length !== steps) throw badRequest(`steps: give ${steps} movements, one per size step`, { steps: `Give ${steps} movements, one per size step` });
      if (input.target.kind === 'vertex' && input.target.index >= piece.outline.length) {
        throw badRequest('target.index: no such point on the outline', { 'target.index': `The outline has ${piece.outline.length} points` });
      }
      const same = (r: GradeRule) => JSON.stringify(r.target) === JSON.stringify(input.target);
      const rules = set.gradeRules[pieceId] ?? [];
      const before = rules.find(same);
      const rule: GradeRule = { target: input.target, landmark: input.landmark ?? before?.landmark, steps: input.steps };
      const next = before ? rules.map((r) => (same(r) ? rule : r)) : [...rules, rule];
      const saved = await sets.save(actor.studioId, styleId, { gradeRules: { ...set.gradeRules, [pieceId]: next } });
      await audit.record(actor, 'update_grade_rule', 'grading_set', saved.id, before ? { pieceId, ...before } : undefined, { pieceId, ...rule });
      return get(actor, styleId);
    },

    /** Propose every piece's rules from the chart (trued against mating seams); drafts the demo blocks if no pieces. */
    async proposeRules(actor: Actor, styleId: number) {
      const style = await styleOf(actor, styleId);
      const set = await setOf(actor, styleId);
      const pieces = style.composition ? draftComposition(style.composition, set.sizeChart, style.baseSize) : set.pieces;
      if (!pieces.length) {
        throw badRequest('composition: choose the blocks this style is drafted from (or a preset) on the style page first', { composition: 'Choose blocks or a preset for this style' });
      }
      // Drafted pieces grade by their blocks redrafted in every size (darts grade their intake); others by role.
      const composition = style.composition;
      const redraft = composition ? (m: BodyMeasurements) => draftStyle(m, { preset: composition.preset, blocks: composition.blocks as BlockSpec[] }) : undefined;
      const { rules } = gradeStyle(pieces, set.sizeChart, style.baseSize, redraft);
      const saved = await sets.save(actor.studioId, styleId, { pieces, gradeRules: rules });
      await audit.record(actor, 'propose_grade_rules', 'grading_set', saved.id, { pieces: set.pieces.length }, { pieces: pieces.length, rules: Object.values(rules).flat().length });
      return get(actor, styleId);
    },

    /** A piece (one size) or its graded set (size 'all' or none) as SVG, DXF or the tiled PDF (one size). */
    async pieceFile(actor: Actor, styleId: number, pieceId: string, kind: 'svg' | 'dxf' | 'pdf', q: { size?: string; paper: 'A4' | 'Letter' }): Promise<Download> {
      const style = await styleOf(actor, styleId);
      const set = await setOf(actor, styleId);
      const computed = await gradeOnPool(set, style);
      const graded = computed.graded[pieceId];
      if (!graded) throw notFound('Piece');
      const size = q.size && q.size !== 'all' ? q.size : kind === 'pdf' ? computed.baseSize : undefined;
      if (size && !graded.sizes.includes(size)) throw badRequest(`size: not in the run (${graded.sizes.join(', ')})`, { size: 'Not in the size run' });
      const piece = size ? graded.bySize[size] : undefined;
      const name = `${style.code}-${pieceId}-${size ?? 'all-sizes'}`;
      if (kind === 'svg') return { body: pieceToSvg(piece ?? graded, { cutting: cuttingOutline, label: true }), type: 'image/svg+xml', filename: `${name}.svg` };
      if (kind === 'dxf') return { body: pieceToDxf(piece ?? graded, { cutting: cuttingOutline }), type: 'application/dxf', filename: `${name}.dxf` };
      const p = piece ?? graded.bySize[computed.baseSize];
      const body = await runCpuTask('piece-tiles.pdf', { piece: p, options: { paper: q.paper, cutting: cuttingOutline(p), title: `${style.code} ${style.name}: ${p.name}, size ${size}`, creationDate: now() } });
      return { body, type: 'application/pdf', filename: `${name}-${q.paper}.pdf` };
    },

    /** Split N garments over the run from customers' bust girths (CSV), with a minimum per size. */
    async sizeMix(actor: Actor, styleId: number, file: UploadedTable | undefined, input: { total: number; minPerSize: number; column?: string; unit?: 'mm' | 'cm' | 'in' }): Promise<SizeMixDto> {
      await styleOf(actor, styleId);
      const set = await sets.byStyle(actor.studioId, styleId);
      const chart = set?.sizeChart ?? demoSizeChart();
      const bust = chart.values.bust;
      if (!bust) throw badRequest('chart: the size chart has no bust row', { chart: 'Add a bust row to the size chart' });
      if (!file) throw badRequest('file: attach a CSV of bust girths', { file: 'Attach a CSV of bust girths' });
      const { values, column, unit } = readBusts(await readTable(file), input.column, input.unit);
      const sizes = chart.sizes;
      if (input.total < sizes.length * input.minPerSize) {
        throw badRequest(`minPerSize: ${input.total} garments cannot give ${input.minPerSize} to each of ${sizes.length} sizes`, { minPerSize: `At most ${Math.floor(input.total / sizes.length)} for ${input.total} garments` });
      }
      const run = sizes.map((size, i) => ({
        size,
        fromMm: i === 0 ? bust[0] - (bust[1] - bust[0]) / 2 : (bust[i - 1] + bust[i]) / 2,
        toMm: i === sizes.length - 1 ? bust[i] + (bust[i] - bust[i - 1]) / 2 : (bust[i] + bust[i + 1]) / 2,
      }));
      const mix = sizeMix(values, run, input.total, input.minPerSize);
      const intervals = en13402BustIntervals();
      const en13402 = [
        { label: '< 74', count: values.filter((v) => v < intervals[0].lowerMm).length },
        ...intervals.map((d) => ({ label: d.label, count: values.filter((v) => v >= d.lowerMm && v < d.upperMm).length })),
        { label: '≥ 131', count: values.filter((v) => v >= intervals[intervals.length - 1].upperMm).length },
      ];
      return {
        total: input.total, minPerSize: input.minPerSize, measured: values.length, outsideRun: mix.outsideRun, column, unit,
        sizes: run.map((r) => ({ ...r, fromMm: Math.round(r.fromMm * 10) / 10, toMm: Math.round(r.toMm * 10) / 10, bodies: mix.bodies[r.size], garments: mix.counts[r.size] })),
        en13402,
      };
    },
  };
}

const UNIT_FACTOR = { mm: 1, cm: 10, in: 25.4 } as const;

/** Bust girths (mm) from a customer table; every bad cell is reported, nothing is used on error. */
function readBusts(rows: string[][], columnName?: string, unitGiven?: 'mm' | 'cm' | 'in') {
  const header = rows[0] ?? [];
  const hasHeader = header.some((c) => c !== '' && Number.isNaN(Number(c)));
  let col = 0;
  if (columnName) {
    col = header.findIndex((c) => c.toLowerCase() === columnName.toLowerCase());
    if (col < 0) throw badRequest(`column: no column "${columnName}" in the header`, { column: `No column "${columnName}"` });
  } else if (hasHeader) {
    col = Math.max(0, header.findIndex((c) => /bust|chest/i.test(c)));
  }
  const label = hasHeader ? header[col] : 'column 1';
  const unit = unitGiven ?? (/\bcm\b|_cm/i.test(label) ? 'cm' : /\bin\b|_in|inch/i.test(label) ? 'in' : 'mm');
  const values: number[] = [];
  const errors: TableError[] = [];
  rows.slice(hasHeader ? 1 : 0).forEach((row, i) => {
    if (row.every((c) => c === '')) return;
    const text = row[col] ?? '';
    const v = Number(text.replace(',', '.'));
    const rowNo = i + (hasHeader ? 2 : 1);
    if (text === '' || !Number.isFinite(v) || v <= 0) errors.push({ row: rowNo, column: col + 1, message: `not a girth: "${text}"` });
    else values.push(v * UNIT_FACTOR[unit]);
  });
  if (errors.length) {
    throw badRequest(`row ${errors[0].row}, column ${errors[0].column}: ${errors[0].message} (${problemCount(errors.length)}; nothing used)`, tableErrorFields(errors));
  }
  if (values.length === 0) throw badRequest('file: no measurements found', { file: 'No measurements found' });
  return { values, column: label, unit };
}
