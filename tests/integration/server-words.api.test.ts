import request from 'supertest';
import type { DataSource } from 'typeorm';
import { beforeAll, describe, expect, it } from 'vitest';
import { BundleEntity, OperationEntity, RollEntity } from '../../server/entities';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
type Lay = { id: number; status: string; rolls: { rollId: number; label: string; plies: number; expectedRemnantMm: number }[] };
let app: Parameters<typeof request>[0];
let ds: DataSource;
let owner: Agent, cutter: Agent, machinist: Agent;
/** The narrow no-break space French sets before : ; ! ? %. */
const NNBSP = '\u202f';

beforeAll(async () => {
  ({ app, ds } = await buildTestApp());
  [owner, cutter, machinist] = await Promise.all([signIn(app, DEMO.owner), signIn(app, DEMO.cutter), signIn(app, DEMO.machinist)]);
});

describe('the server answers an English studio as it always did', () => {
  it('names the field by its key in an English 400, byte for byte', async () => {
    const res = await owner.patch('/api/studio').send({ timeZone: 'Mars/Olympus' });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({
      code: 'validation',
      message: 'timeZone: Not a time zone this server knows (e.g. Africa/Nairobi)',
      fields: { timeZone: 'Not a time zone this server knows (e.g. Africa/Nairobi)' },
    });
    expect(Object.keys(res.body.error)).toEqual(['code', 'message', 'fields', 'requestId']);
    expect((await owner.get('/api/batches/9999')).body.error.message).toBe('Batch not found');
  });
});

describe('a studio in French and inches', () => {
  beforeAll(async () => {
    expect((await owner.patch('/api/studio').send({ language: 'fr', unitSystem: 'imperial', currency: 'CAD', timeZone: 'America/Toronto' })).status).toBe(200);
  });

  it('answers a refused form in French, naming the field in French, with the same shape', async () => {
    const res = await owner.patch('/api/studio').send({ timeZone: 'Mars/Olympus' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation');
    expect(res.body.error.message).toBe(`Fuseau horaire${NNBSP}: pas un fuseau horaire connu du serveur (par exemple America/Toronto)`);
    expect(res.body.error.fields).toEqual({ timeZone: 'Pas un fuseau horaire connu du serveur (par exemple America/Toronto)' });
    expect(Object.keys(res.body.error)).toEqual(['code', 'message', 'fields', 'requestId']);
    const blank = await owner.post('/api/purchasing/suppliers').send({});
    expect(blank.status).toBe(400);
    expect(blank.body.error.message).toMatch(new RegExp(`^Nom${NNBSP}: `));
  });

  it('says not found, forbidden and conflict in French', async () => {
    expect((await owner.get('/api/batches/9999')).body.error).toMatchObject({ code: 'not_found', message: 'Série introuvable' });
    expect((await machinist.get('/api/audit')).body.error).toMatchObject({ code: 'forbidden', message: 'Votre rôle ne permet pas cette action' });
    expect((await owner.get('/api/no-such-thing')).body.error.message).toBe('Cette adresse de l’API n’existe pas');
    const style = (await owner.get('/api/styles')).body.styles[0];
    const twin = await owner.post('/api/styles').send({ code: style.code, name: 'Double', sizeRun: ['S', 'M'], baseSize: 'M' });
    expect(twin.status, JSON.stringify(twin.body)).toBe(409);
    expect(twin.body.error).toMatchObject({ message: 'Un modèle porte déjà ce code', fields: { code: 'Déjà utilisé dans cet atelier' } });
  });

  it('tells a machinist in French that a bundle does not exist or that cutting work is not theirs', async () => {
    const missing = await machinist.post('/api/floor/logs').send({ bundleNumber: 99_999, operationId: 1, idempotencyKey: 'words-key-1' });
    expect(missing.body.error).toMatchObject({ code: 'not_found', message: 'Paquet 99999 introuvable', fields: { bundleNumber: 'Paquet inconnu' } });
    const bundle = (await ds.getRepository(BundleEntity).find({ order: { number: 'ASC' }, take: 1 }))[0];
    const cutting = (await ds.getRepository(OperationEntity).find()).find((o) => o.section === 'cutting')!;
    const res = await machinist.post('/api/floor/logs').send({ bundleNumber: bundle.number, operationId: cutting.id, idempotencyKey: 'words-key-2' });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toBe(`${cutting.code} ${cutting.name} est un travail de coupe${NNBSP}; le rôle «${NNBSP}mécanicienne${NNBSP}» ne peut pas l’enregistrer`);
    expect(res.body.error.fields.operationId).toBe('Pas un travail de mécanicienne');
  });

  it('warns a machinist in French of the operations not yet logged before theirs', async () => {
    const ops = await ds.getRepository(OperationEntity).find({ order: { seq: 'ASC' } });
    const join = ops.find((o) => o.code === 'OP06')!;
    const bundles = ds.getRepository(BundleEntity);
    const bundle = await bundles.save(bundles.create({ studioId: 1, batchId: 1, layId: 0, number: 901, size: 'M', shadeLot: 'A', plyFrom: 1, plyTo: 10, pieces: 10, reopened: {} }));
    const res = await machinist.post('/api/floor/logs').send({ bundleNumber: bundle.number, batchId: bundle.batchId, operationId: join.id, idempotencyKey: 'words-key-3' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.warnings).toContain(`OP02 ${ops.find((o) => o.code === 'OP02')!.name}${NNBSP}: pas encore enregistrée sur ce paquet`);
  });

  it('gives the cutter a narrow roll and a too-long remnant in inches and yards, in French', async () => {
    const lay = ((await cutter.get('/api/lays')).body.lays as Lay[]).find((l) => l.status === 'planned' && l.rolls.length)!;
    const line = lay.rolls[0];
    // 1422.4 mm = 56" and 1450 mm = 57 1/8" to the nearest 1/8 (1 in = 25.4 mm exactly, NIST SP 811 Appendix B).
    await ds.getRepository(RollEntity).update({ id: line.rollId }, { widthMm: 1422.4 });
    const rolls = lay.rolls.map((r) => ({ rollId: r.rollId, actualPlies: r.plies, actualRemnantMm: r.expectedRemnantMm }));
    const narrow = await cutter.put(`/api/lays/${lay.id}`).send({ rolls });
    await ds.getRepository(RollEntity).update({ id: line.rollId }, { widthMm: 1450 });
    expect(narrow.status).toBe(400);
    expect(narrow.body.error.fields['rolls.0.actualPlies']).toBe(
      `Le rouleau ${line.label} a une laize de 56", plus étroite que le placement de 57 1/8"${NNBSP}: il ne peut pas être matelassé pour ce matelas`,
    );
    const roll = await ds.getRepository(RollEntity).findOneByOrFail({ id: line.rollId });
    const tooLong = await cutter.put(`/api/lays/${lay.id}`).send({ rolls: [{ rollId: line.rollId, actualPlies: line.plies, actualRemnantMm: roll.remainingMm + 5000 }] });
    expect(tooLong.status).toBe(400);
    const said = tooLong.body.error.fields['rolls.0.actualRemnantMm'] as string;
    expect(said).toMatch(new RegExp(`^Le rouleau ${line.label} n’avait plus que \\d+ vg`));
    expect(said).not.toMatch(/\d\s?m\b/);
    expect(tooLong.body.error.message).toBe(said);
  });

  it('refuses a packing list in French, row by row', async () => {
    const bad = 'Roll,Length m,Width cm,Shade lot,Received\nP-2,abc,147,Lot D,2026-11-28\nP-3,20,147,,28/11/2026\n';
    const res = await owner.post('/api/fabrics/1/rolls/import').set('X-Seamrun-Csrf', '1').attach('file', Buffer.from(bad), 'packing.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe(`3 problèmes dans la liste de colisage${NNBSP}; rien n’a été importé`);
    expect(res.body.rows).toEqual([
      { row: 2, column: 'Length m', message: 'La longueur «\u202fabc\u202f» n’est pas un nombre positif' },
      { row: 3, column: 'Shade lot', message: 'Le bain est vide' },
      { row: 3, column: 'Received', message: 'La date «\u202f28/11/2026\u202f» n’est pas une date AAAA-MM-JJ' },
    ]);
  });

  it('names a roll left out of a cut plan in French, both widths in inches', async () => {
    // 1397 mm = 55" and 1450 mm = 57 1/8" to the nearest 1/8 (1 in = 25.4 mm exactly, NIST SP 811 Appendix B).
    const add = await owner.post('/api/fabrics/1/rolls').send({ rolls: [{ label: 'NARROW-FR', lengthMm: 60_000, widthMm: 1397, shadeLot: 'Lot N', receivedDate: '2026-11-30' }] });
    expect(add.status).toBe(201);
    const b = await owner.post('/api/batches').send({ styleId: 1, quantities: { XS: 2, S: 4, M: 6, L: 5, XL: 3 }, dueDate: '2027-01-15' });
    const plan = await owner.post(`/api/batches/${b.body.batch.id}/cut-plan`).send({ fabricId: 1, maxPlies: 10, maxGarmentsPerMarker: 3, rollIds: [add.body.rolls[0].id, 1, 2, 3, 4, 5] });
    expect(plan.status, JSON.stringify(plan.body)).toBe(201);
    expect(plan.body.cutPlan.rollRefusals).toEqual([
      `Le rouleau NARROW-FR a une laize de 55", plus étroite que le placement de 57 1/8"${NNBSP}: il ne peut pas être matelassé pour ce matelas`,
    ]);
  });

  it('answers a person in their own language when they picked one', async () => {
    expect((await machinist.patch('/api/auth/me').send({ language: 'en' })).status).toBe(200);
    expect((await machinist.get('/api/audit')).body.error.message).toBe('Your role cannot do this');
    expect((await machinist.patch('/api/auth/me').send({ language: null })).status).toBe(200);
  });

  it('tells a machinist in French that their PIN is locked, and keeps the English for a browser that asks for none', async () => {
    const { app: locking } = await buildTestApp({ env: { LOGIN_LOCK_AFTER: '3' } });
    for (let i = 0; i < 3; i++) await request(locking).post('/api/auth/pin').send({ email: DEMO.machinist, pin: '0000' });
    const fr = await request(locking).post('/api/auth/pin').set('Accept-Language', 'fr').send({ email: DEMO.machinist, pin: '4011' });
    expect(fr.status).toBe(429);
    expect(fr.body.error.message).toBe(`Trop d’essais manqués${NNBSP}; réessayez dans 15 minutes`);
    const en = await request(locking).post('/api/auth/pin').send({ email: DEMO.machinist, pin: '4011' });
    expect(en.body.error.message).toBe('Too many failed attempts; try again in 15 minutes');
  });

  it('refuses a sign-in in the language the browser asks for, English without one', async () => {
    const wrong = { email: DEMO.owner, password: 'not-the-password' };
    const fr = await request(app).post('/api/auth/login').set('Accept-Language', 'fr-CA,fr;q=0.9,en;q=0.5').send(wrong);
    expect(fr.status).toBe(401);
    expect(fr.body.error.message).toBe('E-mail ou mot de passe incorrect');
    expect((await request(app).post('/api/auth/login').send(wrong)).body.error.message).toBe('Email or password is wrong');
  });
});

describe('a size chart refused on import, in a French studio', () => {
  beforeAll(async () => {
    expect((await owner.patch('/api/studio').send({ language: 'fr', unitSystem: 'imperial', currency: 'CAD', timeZone: 'America/Toronto' })).status).toBe(200);
  });

  it('names the bad cell and what is wrong with it in French, and imports nothing', async () => {
    const style = (await owner.get('/api/styles')).body.styles[0];
    const before = (await owner.get(`/api/styles/${style.id}/grading`)).body.grading.chart;
    const bad = ['measurement,unit,S,M', 'bust,in,31,x'].join('\n');
    const res = await owner.post(`/api/styles/${style.id}/grading/chart/import`).set('X-Seamrun-Csrf', '1').attach('file', Buffer.from(bad), 'bad.csv');
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(new RegExp(`^ligne 2, colonne 4${NNBSP}: pas une longueur${NNBSP}: «${NNBSP}x${NNBSP}»`));
    expect(res.body.error.fields['row 2, column 4']).toBe(`Pas une longueur${NNBSP}: «${NNBSP}x${NNBSP}»`);
    expect((await owner.get(`/api/styles/${style.id}/grading`)).body.grading.chart).toEqual(before);
  });
});
