import ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, cutter: Agent, machinist: Agent;
const asBytes = (res: unknown, cb: (err: Error | null, body: Buffer) => void) => {
  const chunks: Buffer[] = [];
  const stream = res as NodeJS.ReadableStream;
  stream.on('data', (c: Buffer) => chunks.push(c));
  stream.on('end', () => cb(null, Buffer.concat(chunks)));
};

beforeAll(async () => {
  const { app } = await buildTestApp();
  owner = await signIn(app, DEMO.owner);
  cutter = await signIn(app, DEMO.cutter);
  machinist = await signIn(app, DEMO.machinist);
}, 60_000);

describe('operations table', () => {
  it('lists the demo breakdown with stable codes and piece rates for the owner', async () => {
    const res = await owner.get('/api/styles/1/operations');
    expect(res.status).toBe(200);
    const ops = res.body.operations;
    expect(ops).toHaveLength(22);
    expect(ops.map((o: { code: string }) => o.code).slice(0, 3)).toEqual(['OP01', 'OP02', 'OP03']);
    expect(ops[0]).toMatchObject({ section: 'cutting', pieceRateMinor: 2000 });
    expect(new Set(ops.map((o: { machineType: string }) => o.machineType))).toEqual(new Set(['cutting', 'hand work', 'pressing', 'lockstitch', 'overlock', 'buttonhole', 'button sew', 'inspection']));
  });

  it('is for the owner only', async () => {
    expect((await cutter.get('/api/styles/1/operations')).status).toBe(403);
    expect((await machinist.get('/api/line/batches/1/plan')).status).toBe(403);
    expect((await cutter.get('/api/line/batches/1/plan')).status).toBe(403);
  });

  it('reports bad rows by field, a loop in the order, and saves nothing', async () => {
    const before = (await owner.get('/api/styles/1/operations')).body.operations;
    const bad = await owner.put('/api/styles/1/operations').send({ operations: [
      { code: 'A1', name: 'x', section: 'sewing', machineType: 'lockstitch', sam: 0, predecessors: ['ZZ'] },
      { code: 'A1', name: '', section: 'ironing', machineType: 'lockstitch', sam: 1, predecessors: [] },
    ] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({ 'operations.0.sam': 'Must be more than 0', 'operations.1.name': 'Name is required', 'operations.1.section': 'Choose cutting, sewing or finishing' });
    const refs = await owner.put('/api/styles/1/operations').send({ operations: [
      { code: 'A1', name: 'x', section: 'sewing', machineType: 'lockstitch', sam: 1, predecessors: ['ZZ'] },
      { code: 'A1', name: 'y', section: 'sewing', machineType: 'lockstitch', sam: 1, predecessors: [] },
    ] });
    expect(refs.body.error.fields).toMatchObject({ 'operations.0.predecessors.0': 'No operation ZZ', 'operations.1.code': 'Code used twice' });
    const loop = await owner.put('/api/styles/1/operations').send({ operations: [
      { code: 'A', name: 'a', section: 'sewing', machineType: 'lockstitch', sam: 1, predecessors: ['B'] },
      { code: 'B', name: 'b', section: 'sewing', machineType: 'lockstitch', sam: 1, predecessors: ['A'] },
    ] });
    expect(loop.status).toBe(400);
    expect(loop.body.error.fields['operations.0.predecessors']).toMatch(/Loop/);
    expect((await owner.get('/api/styles/1/operations')).body.operations).toEqual(before);
  });

  it('exports XLSX, imports it back unchanged, and copies to another style keeping ids by code', async () => {
    const x = await owner.get('/api/styles/1/operations/export').buffer(true).parse(asBytes);
    expect(x.status).toBe(200);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(x.body as unknown as ArrayBuffer);
    expect(wb.worksheets[0].getRow(1).getCell(7).value).toBe('Piece rate (KES)');
    expect(wb.worksheets[0].getRow(2).getCell(7).value).toBe(20);
    const before = (await owner.get('/api/styles/1/operations')).body.operations;
    const back = await owner.post('/api/styles/1/operations/import').set('X-Seamrun-Csrf', '1').attach('file', x.body as Buffer, 'ops.xlsx');
    expect(back.status).toBe(200);
    expect(back.body.operations).toEqual(before);
    const style = await owner.post('/api/styles').send({ code: 'SR-102', name: 'Copy test', sizeRun: ['S', 'M'], baseSize: 'M' });
    const copy = await owner.post(`/api/styles/${style.body.style.id}/operations/copy`).send({ fromStyleId: 1 });
    expect(copy.status).toBe(200);
    expect(copy.body.operations.map((o: { code: string }) => o.code)).toEqual(before.map((o: { code: string }) => o.code));
    const ws = wb.worksheets[0];
    ws.getRow(3).getCell(5).value = 'fast';
    ws.getRow(4).getCell(3).value = 'packing';
    const broken = Buffer.from(await wb.xlsx.writeBuffer());
    const bad = await owner.post('/api/styles/1/operations/import').set('X-Seamrun-Csrf', '1').attach('file', broken, 'ops.xlsx');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({ 'row 3, column 5': expect.stringMatching(/SAM/), 'row 4, column 3': expect.stringMatching(/section/) });
  });
});

describe('line plan of the demo batch', () => {
  it('balances for the due date with the fewest stations and marks the bottleneck', async () => {
    const res = await owner.get('/api/line/batches/1/plan');
    expect(res.status).toBe(200);
    const p = res.body.plan;
    expect(p.quantity).toBe(40);
    expect(p.balance.problem).toBe('salbp-1');
    // One machine type per station: overlock → lockstitch → overlock → lockstitch → buttonhole → button sew.
    expect(p.balance.stationCount).toBe(6);
    expect(p.stations.filter((s: { isBottleneck: boolean }) => s.isBottleneck)).toHaveLength(1);
    const sam = p.stations.reduce((a: number, s: { timeMin: number }) => a + s.timeMin, 0);
    expect(sam).toBeCloseTo(p.balance.sewingSam, 6);
    // Line efficiency = Σ SAM ÷ (stations × bottleneck time) × 100 (production-and-costing.md, line efficiency).
    expect(p.balance.efficiencyPct).toBeCloseTo((100 * p.balance.sewingSam) / (6 * p.balance.cycleTimeMin), 1);
    expect(p.schedule.stages.map((s: { name: string }) => s.name)).toEqual(['cutting', 'sewing', 'finishing']);
    expect(p.schedule.risk).toBe('on-time');
    expect(p.plannedOutput.at(-1).pieces).toBe(40);
    // Flow time (issue 19): the first garment leaves after its bundle of 10 visits all 6 stations, so sewing lasts
    // Q × cycle + (stations − 1) × bundle time, cycle = bottleneck minutes ÷ efficiency.
    const sewing = p.schedule.stages.find((s: { name: string }) => s.name === 'sewing');
    const cycle = sewing.samPerPiece / (sewing.people * p.efficiency);
    expect(sewing.endMinute - sewing.startMinute).toBeCloseTo(40 * cycle + 5 * 10 * cycle, 0);
  });

  it('balances for the people present and says when too few are there', async () => {
    const six = await owner.get('/api/line/batches/1/plan?mode=people&people=6');
    expect(six.status).toBe(200);
    expect(six.body.plan.balance.problem).toBe('salbp-2');
    const eight = await owner.get('/api/line/batches/1/plan?mode=people&people=8');
    expect(eight.body.plan.balance.cycleTimeMin).toBeLessThan(six.body.plan.balance.cycleTimeMin);
    // Issue 19: 5 people were refused ("at least 6"); the shared-operations plan now plans them.
    const five = await owner.get('/api/line/batches/1/plan?mode=people&people=5');
    expect(five.status).toBe(200);
    expect(five.body.plan.balance).toBeNull();
    expect(five.body.plan.staffingNote).toMatch(/at least 6 people/);
    for (const n of [1, 2, 4, 5]) {
      const plan = (await owner.get(`/api/line/batches/1/plan?mode=people&people=${n}`)).body.plan;
      // Pooling every demo minute over n people who run every machine type (issue 19's arithmetic): 24.7 ÷ n.
      expect(plan.staffing.cycleMin).toBeCloseTo(24.7 / n, 2);
      expect(plan.staffing.people).toHaveLength(n);
      expect(plan.staffing.garmentsPerDay).toBe(Math.floor((480 * 0.7 * n) / 24.7));
    }
    const bad = await owner.get('/api/line/batches/1/plan?efficiency=3&people=0');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(expect.arrayContaining(['efficiency', 'people']));
  });

  it('plans with the people on the People page: a machinist deactivated is one fewer at the line', async () => {
    const before = (await owner.get('/api/line/batches/1/plan')).body.plan;
    expect(before.balance.peopleAvailable).toBe(6);
    expect(before.assumptions[0]).toBe('Staff from the People page: 6 machinists, each taken to run every sewing machine type; 1 cutter; 2 finishers.');
    const people = (await owner.get('/api/users')).body.users as { id: number; email: string }[];
    const sixth = people.find((u) => u.email === 'machinist6@tamarind.example')!;
    expect((await owner.patch(`/api/users/${sixth.id}`).send({ active: false })).status).toBe(200);
    try {
      const after = (await owner.get('/api/line/batches/1/plan')).body.plan;
      expect(after.balance.peopleAvailable).toBe(5);
      expect(after.assumptions[0]).toContain('5 machinists');
    } finally {
      await owner.patch(`/api/users/${sixth.id}`).send({ active: true });
    }
  });

  it('shows overtime and the ILO C1 caution when the due date is too close', async () => {
    await owner.patch('/api/batches/1').send({ dueDate: '2026-12-02' });
    const res = await owner.get('/api/line/batches/1/plan?mode=people&people=6&efficiency=0.4');
    const s = res.body.plan.schedule;
    expect(s.risk).toBe('late');
    expect(s.overtimeMinutesPerDay).toBeGreaterThan(0);
    // ILO Hours of Work (Industry) Convention, 1919 (No. 1): 8 hours a day, 48 a week.
    expect(s.exceedsIlo).toBe(true);
    expect(s.caution).toMatch(/ILO/);
  });
});

describe('shared operations for the people present (issue 19)', () => {
  type Staffed = { personId: number | null; name: string; loadMin: number; idleMin: number; isBottleneck: boolean; operations: { code: string; machineType: string; share: number; pinned: boolean }[] };
  const machinists = async () => ((await owner.get('/api/users')).body.users as { id: number; email: string; role: string }[]).filter((u) => u.role === 'machinist');

  it('plans 3 machinists with garments per day where the straight line refused fewer than 6', async () => {
    const all = await machinists();
    const away = all.slice(3);
    for (const u of away) expect((await owner.patch(`/api/users/${u.id}`).send({ active: false })).status).toBe(200);
    try {
      const res = await owner.get('/api/line/batches/1/plan?mode=people');
      expect(res.status).toBe(200);
      const p = res.body.plan;
      expect(p.peopleAvailable).toBe(3);
      expect(p.balance).toBeNull();
      expect(p.staffing.people).toHaveLength(3);
      // Pooling (issue 19's arithmetic, common practice): 24.7 demo minutes over 3 people = 8.233 min a garment;
      // 480 min × 70 % ÷ 8.233 = 40.8 → 40 whole garments a day.
      expect(p.staffing.cycleMin).toBeCloseTo(24.7 / 3, 2);
      expect(p.staffing.garmentsPerDay).toBe(40);
      expect(p.staffing.method).toBe('exact');
      const codes = p.staffing.people.flatMap((x: Staffed) => x.operations.map((o) => o.code));
      expect(new Set(codes).size).toBe(15);
      expect(p.staffing.people.filter((x: Staffed) => x.isBottleneck)).toHaveLength(1);
      expect(p.schedule.stages.find((s: { name: string }) => s.name === 'sewing').people).toBe(3);
    } finally {
      for (const u of away) await owner.patch(`/api/users/${u.id}`).send({ active: true });
    }
  });

  it('keeps to the studio\'s machine count: 2 lockstitch machines, at most 2 people on lockstitch', async () => {
    expect((await owner.patch('/api/studio').send({ machines: { lockstitch: 2 } })).body.studio.machines).toEqual({ lockstitch: 2 });
    try {
      const p = (await owner.get('/api/line/batches/1/plan?mode=people')).body.plan;
      const onLockstitch = p.staffing.people.filter((x: Staffed) => x.operations.some((o) => o.machineType === 'lockstitch'));
      expect(onLockstitch.length).toBeLessThanOrEqual(2);
      // By hand from the demo minutes: 17.3 lockstitch minutes on 2 machines bound the cycle at 8.65 min, and the
      // other 7.4 minutes fit on the 4 others, so 8.65 is the optimum.
      expect(p.staffing.cycleMin).toBeCloseTo(8.65, 2);
    } finally {
      await owner.patch('/api/studio').send({ machines: {} });
    }
  });

  it('gives a person no share of a machine type missing from their skills, and keeps a pin', async () => {
    const [first, second] = await machinists();
    const set = await owner.patch(`/api/users/${first.id}`).send({ skills: { overlock: 1.2 } });
    expect(set.status).toBe(200);
    expect(set.body.user).toMatchObject({ skills: { overlock: 1.2 }, skillsSet: true });
    try {
      const p = (await owner.get(`/api/line/batches/1/plan?mode=people&pins=${second.id}:OP17`)).body.plan;
      const mine = p.staffing.people.find((x: Staffed) => x.personId === first.id);
      expect(mine.operations.length).toBeGreaterThan(0);
      expect(mine.operations.every((o: { machineType: string }) => o.machineType === 'overlock')).toBe(true);
      const pinned = p.staffing.people.find((x: Staffed) => x.personId === second.id).operations.find((o: { code: string }) => o.code === 'OP17');
      expect(pinned).toMatchObject({ pinned: true });
      // Pinned to a machine type missing from the skills: a 400 on the pins, naming the person.
      const cannot = await owner.get(`/api/line/batches/1/plan?mode=people&pins=${first.id}:OP05`);
      expect(cannot.status).toBe(400);
      expect(cannot.body.error.fields.pins).toMatch(/cannot run lockstitch/);
    } finally {
      const back = await owner.patch(`/api/users/${first.id}`).send({ skills: null });
      expect(back.body.user).toMatchObject({ skills: { lockstitch: 1, overlock: 1 }, skillsSet: false });
    }
  });

  it('keeps each person within the cap on operations, and says when the cap cannot cover the line', async () => {
    const p = (await owner.get('/api/line/batches/1/plan?mode=people&maxOps=3')).body.plan;
    expect(p.staffing.maxOperationsPerPerson).toBe(3);
    for (const x of p.staffing.people as Staffed[]) expect(x.operations.length).toBeLessThanOrEqual(3);
    expect(new Set((p.staffing.people as Staffed[]).flatMap((x) => x.operations.map((o) => o.code))).size).toBe(15);
    // 6 people × 2 operations cannot cover the 15 sewing operations.
    const tooFew = await owner.get('/api/line/batches/1/plan?mode=people&maxOps=2');
    expect(tooFew.status).toBe(400);
    expect(tooFew.body.error.fields.maxOps).toMatch(/cannot cover 15 operations/);
  });

  it('answers bad skills, machines and pins with a 400 naming the field, and saves nothing', async () => {
    const [first] = await machinists();
    const pace = await owner.patch(`/api/users/${first.id}`).send({ skills: { lockstitch: 5 } });
    expect(pace.status).toBe(400);
    expect(Object.keys(pace.body.error.fields)[0]).toMatch(/^skills/);
    const count = await owner.patch('/api/studio').send({ machines: { overlock: 1.5 } });
    expect(count.status).toBe(400);
    expect(Object.keys(count.body.error.fields)[0]).toMatch(/^machines/);
    expect((await owner.get('/api/studio')).body.studio.machines).toEqual({});
    const badPin = await owner.get('/api/line/batches/1/plan?mode=people&pins=abc');
    expect(badPin.status).toBe(400);
    expect(badPin.body.error.fields).toHaveProperty('pins');
    const nobody = await owner.get('/api/line/batches/1/plan?mode=people&pins=999999:OP17');
    expect(nobody.status).toBe(400);
    expect(nobody.body.error.fields).toHaveProperty('pins');
  });
});
