import { can } from '../../../shared/auth/permissions';
import { parseBundleQr } from '../../../shared/schemas/floor';
import type { SearchHitDto } from '../../../shared/schemas/search';
import type { Actor } from '../../auth/require';
import { batchCode } from '../../../shared/schemas/batches';
import type { SearchRepository } from './search.repository';

const BATCH_CODE = /^b-?0*(\d{1,9})$/i;

/**
 * One search over the studio's bundles (number or QR text), styles (code or name), rolls (label), batches
 * (code) and people (name or e-mail); each kind only for a role that may see it (shared/auth/permissions.ts).
 */
export function createSearchService(repo: SearchRepository) {
  return {
    async search(actor: Actor, q: string): Promise<SearchHitDto[]> {
      const studioId = actor.studioId;
      const hits: SearchHitDto[] = [];
      const qr = parseBundleQr(q);
      const number = /^\d{1,9}$/.test(q) ? Number(q) : null;
      if (can(actor.role, 'bundles:read') && (qr || number !== null)) {
        const bundles = qr ? await repo.bundlesByNumber(studioId, qr.bundleNumber, qr.batchId) : await repo.bundlesByNumber(studioId, number!);
        const batches = new Map((await repo.batchesByIds(studioId, [...new Set(bundles.map((b) => b.batchId))])).map((b) => [b.id, b]));
        for (const b of bundles) {
          const batch = batches.get(b.batchId);
          hits.push({ kind: 'bundle', id: b.id, title: `${b.number}`, detail: `${batch ? batchCode(batch) : ''} · ${b.size} · ${b.pieces}`, layId: b.layId });
        }
      }
      const batchNumber = BATCH_CODE.exec(q)?.[1];
      if (can(actor.role, 'batches:read') && batchNumber) {
        const batch = await repo.batchByNumber(studioId, Number(batchNumber));
        if (batch) {
          const lay = await repo.firstLayOf(studioId, batch.id);
          hits.push({ kind: 'batch', id: batch.id, title: batchCode(batch), detail: batch.style?.name ?? '', ...(lay ? { layId: lay.id } : {}) });
        }
      }
      if (can(actor.role, 'styles:read')) {
        for (const s of await repo.stylesByText(studioId, q)) hits.push({ kind: 'style', id: s.id, title: s.code, detail: s.name });
      }
      if (can(actor.role, 'fabric:read')) {
        for (const r of await repo.rollsByLabel(studioId, q)) hits.push({ kind: 'roll', id: r.id, title: r.label, detail: `${r.fabric?.name ?? ''} · ${r.shadeLot}` });
      }
      if (can(actor.role, 'people:manage')) {
        for (const u of await repo.peopleByText(studioId, q)) hits.push({ kind: 'person', id: u.id, title: u.name, detail: u.email });
      }
      return hits;
    },
  };
}
export type SearchService = ReturnType<typeof createSearchService>;
