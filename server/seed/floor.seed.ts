import { AttendanceEntity, BatchEntity, BundleEntity, LayEntity, OperationEntity, UserEntity, WorkLogEntity } from '../entities';
import type { SeedContext } from './seed-context';

/** Garments per demo bundle when this seeder has to make the bundles itself. */
const DEMO_BUNDLE_SIZE = 10;
const DAY_MS = 86_400_000;

/** Used only when the line seed has not given the demo style its operations (our own invented list). */
const FALLBACK_OPERATIONS: Omit<OperationEntity, 'id' | 'studioId' | 'styleId' | 'timeStudy' | 'pieceRate'>[] = [
  { seq: 1, code: 'OP01', name: 'Join shoulders', section: 'sewing', machineType: 'overlock', sam: 0.6, predecessors: [], pieceRateMinor: 600 },
  { seq: 2, code: 'OP02', name: 'Attach collar band', section: 'sewing', machineType: 'lockstitch', sam: 1.4, predecessors: ['OP01'], pieceRateMinor: 1400 },
  { seq: 3, code: 'OP03', name: 'Set sleeves', section: 'sewing', machineType: 'lockstitch', sam: 1.2, predecessors: ['OP01'], pieceRateMinor: 1200 },
  { seq: 4, code: 'OP04', name: 'Close side seams', section: 'sewing', machineType: 'overlock', sam: 0.9, predecessors: ['OP03'], pieceRateMinor: 900 },
  { seq: 5, code: 'OP05', name: 'Hem', section: 'sewing', machineType: 'lockstitch', sam: 0.8, predecessors: ['OP04'], pieceRateMinor: 800 },
  { seq: 6, code: 'OP06', name: 'Pressing', section: 'finishing', machineType: 'iron', sam: 0.7, predecessors: ['OP02', 'OP05'], pieceRateMinor: 500 },
  { seq: 7, code: 'OP07', name: 'Quality check', section: 'finishing', machineType: 'inspection', sam: 0.5, predecessors: ['OP06'], pieceRateMinor: 400 },
  { seq: 8, code: 'OP08', name: 'Packing', section: 'finishing', machineType: 'table', sam: 0.3, predecessors: ['OP07'], pieceRateMinor: 300 },
];

async function ensureOperations(ctx: SeedContext) {
  const repo = ctx.ds.getRepository(OperationEntity);
  const existing = await repo.find({ where: { studioId: ctx.studioId, styleId: ctx.styleId }, order: { seq: 'ASC' } });
  if (existing.length) return existing;
  return repo.save(FALLBACK_OPERATIONS.map((o) => repo.create({ ...o, studioId: ctx.studioId, styleId: ctx.styleId })));
}

/** Bundles of the demo batch, made here only when the cutting seed has made none. */
async function ensureBundles(ctx: SeedContext) {
  const repo = ctx.ds.getRepository(BundleEntity);
  const existing = await repo.find({ where: { studioId: ctx.studioId, batchId: ctx.batchId }, order: { number: 'ASC' } });
  if (existing.length) return existing;
  const batch = await ctx.ds.getRepository(BatchEntity).findOneByOrFail({ id: ctx.batchId });
  const lay = await ctx.ds.getRepository(LayEntity).findOne({ where: { studioId: ctx.studioId, batchId: ctx.batchId }, order: { seq: 'ASC' } });
  const rows: Partial<BundleEntity>[] = [];
  // Bundle numbers are unique in the studio: count on from its last one.
  const last = await repo.findOne({ where: { studioId: ctx.studioId }, order: { number: 'DESC' } });
  let number = (last?.number ?? 0) + 1;
  for (const [size, qty] of Object.entries(batch.quantities)) {
    for (let from = 1; from <= qty; from += DEMO_BUNDLE_SIZE) {
      const to = Math.min(qty, from + DEMO_BUNDLE_SIZE - 1);
      rows.push({ studioId: ctx.studioId, batchId: ctx.batchId, layId: lay?.id ?? 0, number: number++, size, shadeLot: 'A', plyFrom: from, plyTo: to, pieces: to - from + 1, reopened: {} });
    }
  }
  return repo.save(rows.map((r) => repo.create(r)));
}

/** Demo data of the floor area: attendance for the floor team and the first bundles sewn and packed. */
export async function seedFloor(ctx: SeedContext): Promise<void> {
  const ops = await ensureOperations(ctx);
  const bundles = await ensureBundles(ctx);
  const people = await ctx.ds.getRepository(UserEntity).find({ where: { studioId: ctx.studioId }, order: { id: 'ASC' } });
  const machinists = people.filter((p) => p.role === 'machinist');
  const finishers = people.filter((p) => p.role === 'finisher');
  // Attendance for the day lay 1 was cut and sewing began (yesterday), 8 hours each.
  const days = [new Date(Date.UTC(ctx.today.getUTCFullYear(), ctx.today.getUTCMonth(), ctx.today.getUTCDate()) - DAY_MS)];
  const attendance = ctx.ds.getRepository(AttendanceEntity);
  await attendance.save(
    days.flatMap((d) => [...machinists, ...finishers].map((p) => attendance.create({ studioId: ctx.studioId, userId: p.id, day: d.toISOString().slice(0, 10), minutes: 480 }))),
  );
  const cutter = people.find((p) => p.role === 'cutter');
  if (!machinists.length || !finishers.length || !cutter) return;
  // Yesterday, when lay 1 was cut: the cutting-room operations of every bundle, bundle 1 sewn, finished and
  // bagged, bundle 2 half sewn. Later bundles wait for the sewing line.
  const yesterday = new Date(Date.UTC(ctx.today.getUTCFullYear(), ctx.today.getUTCMonth(), ctx.today.getUTCDate()) - DAY_MS);
  const logs = ctx.ds.getRepository(WorkLogEntity);
  const rows: Partial<WorkLogEntity>[] = [];
  const sewing = ops.filter((o) => o.section === 'sewing');
  const plan = (i: number) => {
    const cutting = ops.filter((o) => o.section === 'cutting');
    if (i === 0) return ops;
    if (i === 1) return [...cutting, ...sewing.slice(0, Math.ceil(sewing.length / 2))];
    return cutting;
  };
  bundles.forEach((b, bi) => {
    plan(bi).forEach((o, oi) => {
      const person = o.section === 'cutting' ? cutter : o.section === 'finishing' ? finishers[oi % finishers.length] : machinists[oi % machinists.length];
      rows.push({
        studioId: ctx.studioId,
        bundleId: b.id,
        operationId: o.id,
        attempt: 0,
        userId: person.id,
        pieces: b.pieces,
        earnedMinutes: b.pieces * o.sam,
        payMinor: b.pieces * (o.pieceRateMinor ?? 0),
        idempotencyKey: `seed-${b.id}-${o.id}`,
        outcome: /quality|inspect|check/i.test(o.name) ? 'pass' : '',
        defect: '',
        createdAt: new Date(yesterday.getTime() + (7 * 60 + bi * 5 + oi * 20) * 60_000),
      });
    });
  });
  await logs.save(rows.map((r) => logs.create(r)));
}
