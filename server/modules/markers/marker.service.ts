import { markerToDxf } from '@exports/dxf/marker-dxf';
import { ratioText, type CreateMarkerInput } from '../../../shared/schemas/markers';
import type { Actor } from '../../auth/require';
import type { FabricEntity, MarkerEntity } from '../../entities';
import { badRequest, conflict, notFound } from '../../errors';
import type { Download } from '../../middleware/download';
import type { AuditRepository } from '../audit/audit.repository';
import type { BatchRepository } from '../batches/batch.repository';
import { batchCode } from '../../../shared/schemas/batches';
import type { CuttingPieceSource } from '../grading/graded-pieces';
import type { StyleRepository } from '../styles/style.repository';
import { buildMarkerInput, fabricShrinkage, markerInputHash, piecesOnFabric, type MarkerJobInput } from './marker-input';
import { presentMarker } from './marker.presenter';
import type { MarkerQueue } from './marker-queue';
import type { MarkerRepository } from './marker.repository';
import { markerSvg } from './marker-svg';
import { markerPlotInput } from './marker-plot';
import { documentSettings } from '../studios/document-settings';
import { runCpuTask } from '../../jobs/cpu-pool';

/** The fabrics a marker is laid on; the cutting area owns them and hands this lookup in. */
export interface FabricLookup {
  get(studioId: number, id: number): Promise<FabricEntity | null>;
}

export interface MarkerServiceDeps {
  markers: MarkerRepository;
  styles: Pick<StyleRepository, 'get'>;
  batches: Pick<BatchRepository, 'get'>;
  fabrics: FabricLookup;
  /** The style's cutting pieces per size (the grading area's loader). */
  cuttingPieces: CuttingPieceSource;
  queue: () => MarkerQueue;
  audit: AuditRepository;
  /** Default budget (NESTING_SECONDS). */
  defaultSeconds: number;
  /** The date printed on a marker plot. */
  now?: () => Date;
}

export type MarkerService = ReturnType<typeof createMarkerService>;

/** Starting, reading and cancelling markers; the hash of the inputs makes an unchanged marker free. */
export function createMarkerService(deps: MarkerServiceDeps) {
  const { markers, audit, styles, batches, fabrics } = deps;

  /** Build, hash and store a marker job; returns the stored marker when one with the same inputs exists. */
  async function start(studioId: number, input: CreateMarkerInput): Promise<{ marker: MarkerEntity; reused: boolean }> {
    const style = await styles.get(studioId, input.styleId);
    if (!style) throw badRequest('styleId: no such style in this studio', { styleId: 'No such style' });
    if (input.batchId !== undefined) {
      const batch = await batches.get(studioId, input.batchId);
      if (!batch || batch.styleId !== style.id) throw badRequest('batchId: no such batch of this style', { batchId: 'No such batch of this style' });
    }
    const fabric = await fabrics.get(studioId, input.fabricId);
    if (!fabric) throw badRequest('fabricId: no such fabric in this studio', { fabricId: 'No such fabric' });
    const fields: Record<string, string> = {};
    for (const size of Object.keys(input.ratio)) if (!style.sizeRun.includes(size)) fields[`ratio.${size}`] = `Size ${size} is not in the style's size run`;
    if (Object.keys(fields).length) throw badRequest(Object.values(fields)[0], fields);
    const all = await deps.cuttingPieces(studioId, style.id);
    if (Object.keys(all).length === 0) throw conflict('This style has no graded pieces yet: grade it first');
    const pieces = piecesOnFabric(all, style.materialFabrics, fabric);
    const ratio = Object.fromEntries(style.sizeRun.filter((s) => (input.ratio[s] ?? 0) > 0).map((s) => [s, input.ratio[s]]));
    const job = buildMarkerInput(pieces, ratio, {
      widthMm: fabric.widthMm,
      isDirectional: fabric.isDirectional,
      seconds: input.seconds ?? deps.defaultSeconds,
      shrinkage: fabricShrinkage(fabric),
    });
    const inputHash = markerInputHash(job);
    const existing = await markers.byHash(studioId, inputHash);
    if (existing) return { marker: existing, reused: true };
    // The studio's place in the queue is taken before the row is stored, so a full queue stores nothing.
    const release = await deps.queue().reserve(studioId);
    try {
      const marker = await markers.insert({
        studioId, styleId: style.id, batchId: input.batchId ?? null, fabricId: fabric.id, ratio,
        widthMm: fabric.widthMm, inputHash, status: 'queued', input: job, result: null, error: '',
      });
      deps.queue().enqueue(studioId, marker.id, job);
      return { marker, reused: false };
    } finally {
      release();
    }
  }

  async function get(studioId: number, id: number, withDrawing = true) {
    const m = await markers.get(studioId, id);
    if (!m) throw notFound('Marker');
    return { entity: m, dto: presentMarker(m, deps.queue().progress(id), withDrawing) };
  }

  /** The finished marker as a file: SVG to look at, or DXF at 1:1 for a plotter or cutting table (millimetres). */
  async function file(studioId: number, id: number, kind: 'svg' | 'dxf' | 'pdf'): Promise<Download> {
    const { entity, dto } = await get(studioId, id);
    if (!dto.drawing || dto.lengthMm === null) throw conflict('This marker has no finished layout yet');
    const style = await styles.get(studioId, dto.styleId);
    const sizes = style?.sizeRun ?? Object.keys(dto.ratio);
    const size = `${Math.round(dto.lengthMm)} mm × ${Math.round(dto.widthMm)} mm`;
    // The batch goes in the title and every file name, so a plotter queue shows whose marker it is.
    const batchRow = dto.batchId ? await markers.batch(studioId, dto.batchId) : null;
    const batch = batchRow ? batchCode(batchRow) : null;
    const name = `marker-${[batch, style?.code, dto.id].filter(Boolean).join('-')}`;
    if (kind === 'svg') {
      const title = `${[batch, style?.code ?? 'Marker'].filter(Boolean).join(' · ')} ${ratioText(dto.ratio, sizes)} · ${size}`;
      return { body: markerSvg(dto.drawing, { lengthMm: dto.lengthMm, widthMm: dto.widthMm, sizes, title }), type: 'image/svg+xml', filename: `${name}.svg` };
    }
    if (kind === 'pdf') {
      const studio = await markers.studio(studioId);
      const input = markerPlotInput(
        { lengthMm: dto.lengthMm, widthMm: dto.widthMm, ratio: dto.ratio, drawing: dto.drawing, notches: (entity.input as MarkerJobInput | null)?.notches },
        { studioName: studio.name, dateIso: (deps.now?.() ?? new Date()).toISOString(), styleCode: style?.code ?? '', styleName: style?.name ?? '', batchCode: batch ?? 'no batch', sizes },
        { ...documentSettings(studio), unitSystem: studio.unitSystem },
      );
      return { body: await runCpuTask('marker-plot.pdf', input), type: 'application/pdf', filename: `${name}.pdf` };
    }
    const title = [batch, style?.code ?? 'Marker', ratioText(dto.ratio, sizes), size].filter(Boolean).join(' · ');
    const body = markerToDxf({ outlines: dto.drawing.outlines, placements: dto.drawing.placements, lengthMm: dto.lengthMm, widthMm: dto.widthMm, title });
    return { body, type: 'application/dxf', filename: `${name}.dxf` };
  }

  return {
    async create(actor: Actor, input: CreateMarkerInput) {
      const { marker, reused } = await start(actor.studioId, input);
      if (!reused) await audit.record(actor, 'create', 'marker', marker.id, undefined, { ratio: marker.ratio, fabricId: marker.fabricId, inputHash: marker.inputHash });
      return { marker: presentMarker(marker, deps.queue().progress(marker.id)), reused };
    },
    start,
    get,
    file,
    async list(studioId: number, where: { styleId?: number; batchId?: number }) {
      return (await markers.list(studioId, where)).map((m) => presentMarker(m, deps.queue().progress(m.id)));
    },
    async cancel(actor: Actor, id: number) {
      const m = await markers.get(actor.studioId, id);
      if (!m) throw notFound('Marker');
      if (m.status !== 'queued' && m.status !== 'running') throw conflict(`This marker is ${m.status}; only a queued or running marker can be cancelled`);
      const wasRunning = deps.queue().cancel(id);
      if (!wasRunning) await markers.update(actor.studioId, id, { status: 'cancelled', error: 'Cancelled before it started.' });
      await audit.record(actor, 'cancel', 'marker', id, { status: m.status }, { status: wasRunning ? 'cancelling' : 'cancelled' });
      const after = (await markers.get(actor.studioId, id))!;
      return presentMarker(after, deps.queue().progress(id));
    },
  };
}
