import { beforeAll, describe, expect, it } from 'vitest';
import { binary, buildTestApp, DEMO, signIn } from '../fixtures/test-app';
import { readWorkbook } from '../../exports/xlsx/workbook-reader.testing';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent;
let machinist: Agent;

beforeAll(async () => {
  const { app } = await buildTestApp();
  owner = await signIn(app, DEMO.owner);
  machinist = await signIn(app, DEMO.machinist);
});

describe('a studio in its language, units and time zone', () => {
  it('starts English and UTC, then keeps the language and IANA zone the owner picks', async () => {
    const before = (await owner.get('/api/auth/me')).body.user;
    expect([before.language, before.timeZone, before.ownLanguage]).toEqual(['en', 'UTC', null]);
    const res = await owner.patch('/api/studio').send({ language: 'fr', timeZone: 'America/Toronto', unitSystem: 'imperial', currency: 'CAD' });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.studio).toMatchObject({ language: 'fr', timeZone: 'America/Toronto' });
    expect((await machinist.get('/api/auth/me')).body.user).toMatchObject({ language: 'fr', studioLanguage: 'fr', timeZone: 'America/Toronto', unitSystem: 'imperial' });
  });

  it('refuses a time zone that does not exist with a 400 naming the field, and keeps the saved one', async () => {
    const res = await owner.patch('/api/studio').send({ timeZone: 'Mars/Olympus' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/^Fuseau horaire\u202f: /);
    expect((await owner.get('/api/studio')).body.studio.timeZone).toBe('America/Toronto');
    expect((await owner.patch('/api/studio').send({ language: 'de' })).status).toBe(400);
  });

  it('lets a person read in their own language while the studio keeps its own', async () => {
    const mine = await machinist.patch('/api/auth/me').send({ language: 'en' });
    expect(mine.status).toBe(200);
    expect(mine.body.user).toMatchObject({ language: 'en', ownLanguage: 'en', studioLanguage: 'fr' });
    expect((await owner.get('/api/auth/me')).body.user.language).toBe('fr');
    const back = await machinist.patch('/api/auth/me').send({ language: null });
    expect(back.body.user).toMatchObject({ language: 'fr', ownLanguage: null });
    expect((await machinist.patch('/api/auth/me').send({ language: 'xx' })).status).toBe(400);
  });

  it('writes the costing workbook in the studio language and units', async () => {
    const res = await owner.get('/api/batches/1/costing.xlsx').buffer(true).parse(binary);
    expect(res.status).toBe(200);
    const sheet = (await readWorkbook(res.body as Buffer)).worksheets[0];
    expect(sheet.name).toBe('Fiche de prix de revient');
    const cells: string[] = [];
    sheet.eachRow((row) => row.eachCell((c) => { if (typeof c.value === 'string') cells.push(c.value); }));
    expect(cells).toContain('verges');
    expect(cells.join('\n')).not.toMatch(/Unit cost|Sewing and finishing|Overheads|metres/);
  });
});
