import { beforeAll, describe, expect, it } from 'vitest';
import { buildBatchInput, buildStyleInput } from '../fixtures/factories';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

let owner: Awaited<ReturnType<typeof signIn>>;
beforeAll(async () => {
  const { app } = await buildTestApp();
  owner = await signIn(app, DEMO.owner);
});

describe('styles and batches', () => {
  it('lists the demo style and its batch of 40', async () => {
    const styles = (await owner.get('/api/styles')).body.styles;
    expect(styles[0]).toMatchObject({ code: 'SR-101', name: 'Sable shirt dress', sizeRun: ['XS', 'S', 'M', 'L', 'XL'], baseSize: 'M' });
    const [batch] = (await owner.get('/api/batches')).body.batches;
    expect(batch).toMatchObject({ total: 40, quantities: { XS: 4, S: 8, M: 12, L: 10, XL: 6 }, dueDate: '2026-12-22' });
  });

  it('creates a batch of 40 dresses in five sizes', async () => {
    const res = await owner.post('/api/batches').send(buildBatchInput(1));
    expect(res.status).toBe(201);
    expect(res.body.batch.total).toBe(40);
    expect(res.body.batch.code).toMatch(/^B-\d{4}$/);
  });

  it('reports each bad field of a batch and saves nothing', async () => {
    const before = (await owner.get('/api/batches')).body.batches.length;
    const res = await owner.post('/api/batches').send({ styleId: 1, quantities: { XS: 1.5, S: -2 }, dueDate: '22/12/2026' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      'quantities.XS': 'Whole garments only',
      'quantities.S': 'Cannot be negative',
      dueDate: 'Use a date as YYYY-MM-DD',
    });
    const wrongSize = await owner.post('/api/batches').send(buildBatchInput(1, { quantities: { XXL: 3 } }));
    expect(wrongSize.status).toBe(400);
    expect(wrongSize.body.error.fields['quantities.XXL']).toMatch(/not in the style's size run/);
    expect((await owner.get('/api/batches')).body.batches.length).toBe(before);
  });

  it('refuses a base size outside the run and a duplicate code', async () => {
    const bad = await owner.post('/api/styles').send(buildStyleInput({ baseSize: 'XXL' }));
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.baseSize).toBe('Base size must be one of the size run');
    const dup = await owner.post('/api/styles').send(buildStyleInput({ code: 'SR-101' }));
    expect(dup.status).toBe(409);
    expect(dup.body.error.fields.code).toBeTruthy();
  });

  it('answers 404 for a batch that is not there and 400 for a malformed id', async () => {
    expect((await owner.get('/api/batches/999')).status).toBe(404);
    const bad = await owner.get('/api/batches/abc');
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.id).toBeTruthy();
  });

  it('records who changed a batch in the audit trail', async () => {
    await owner.patch('/api/batches/1').send({ notes: 'Belt loops added' });
    const { entries } = (await owner.get('/api/audit')).body;
    expect(entries[0]).toMatchObject({ action: 'update', entity: 'batch', entityId: 1, userName: 'Zawadi Kerubo' });
    expect(entries[0].after).toContain('Belt loops added');
  });
});

describe('people', () => {
  it('adds staff with a temporary password they must change, and deactivation signs them out', async () => {
    const { app } = await buildTestApp();
    const boss = await signIn(app, DEMO.owner);
    const add = await boss.post('/api/users').send({ name: 'Pendo Njeri', email: 'pendo@tamarind.example', role: 'finisher', temporaryPassword: 'temporary-123' });
    expect(add.status).toBe(201);
    expect(add.body.user.mustChangePassword).toBe(true);
    const pendo = await signIn(app, 'pendo@tamarind.example', 'temporary-123');
    expect((await pendo.get('/api/auth/me')).body.user.mustChangePassword).toBe(true);
    const blocked = await pendo.get('/api/batches');
    expect(blocked.status).toBe(403);
    expect(blocked.body.error.code).toBe('password_change_required');
    await boss.patch(`/api/users/${add.body.user.id}`).send({ active: false });
    expect((await pendo.get('/api/auth/me')).status).toBe(401);
  });

  it('will not let the owner demote or deactivate themselves', async () => {
    const { app } = await buildTestApp();
    const boss = await signIn(app, DEMO.owner);
    const res = await boss.patch('/api/users/1').send({ role: 'cutter' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.role).toBeTruthy();
  });
});

describe('batch due dates are real calendar dates', () => {
  it('refuses an impossible due date with a 400 naming the field, on create and on change, and keeps the saved one', async () => {
    const before = (await owner.get('/api/batches')).body.batches.length;
    for (const dueDate of ['2026-13-45', '2026-11-31', '2026-02-29']) {
      const res = await owner.post('/api/batches').send(buildBatchInput(1, { dueDate }));
      expect(res.status, dueDate).toBe(400);
      expect(res.body.error.fields.dueDate).toBe('Not a real date: that day does not exist in the calendar');
    }
    expect((await owner.get('/api/batches')).body.batches.length).toBe(before);
    const saved = (await owner.get('/api/batches/1')).body.batch.dueDate;
    const patch = await owner.patch('/api/batches/1').send({ dueDate: '2026-13-45' });
    expect(patch.status).toBe(400);
    expect(patch.body.error.fields.dueDate).toBeTruthy();
    expect((await owner.get('/api/batches/1')).body.batch.dueDate).toBe(saved);
  });
});
