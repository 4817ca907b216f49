import { beforeAll, describe, expect, it } from 'vitest';
import { buildTestApp, DEMO, signIn } from '../fixtures/test-app';

type Agent = Awaited<ReturnType<typeof signIn>>;
let owner: Agent, machinist: Agent;
// The test clock starts at TEST_TODAY, 1 Dec 2026 08:00 UTC: still 30 November, 22:00, in Honolulu (UTC−10 all year, IANA tzdata).

beforeAll(async () => {
  const built = await buildTestApp();
  owner = await signIn(built.app, DEMO.owner);
  machinist = await signIn(built.app, DEMO.machinist);
}, 60_000);

const nairobiSixDays = {
  timeZone: 'Africa/Nairobi', workdays: [1, 2, 3, 4, 5, 6], shiftStart: '08:00', shiftEnd: '17:00', breakMinutes: 60,
  holidays: ['2026-12-12', '2026-12-25'], overtimeLimitHoursPerWeek: 12,
};

describe('working calendar', () => {
  it('starts from Monday to Friday at the studio’s working day in UTC with the usual caution, for the owner only', async () => {
    const res = await owner.get('/api/line/calendar');
    expect(res.status).toBe(200);
    expect(res.body.calendar).toMatchObject({ timeZone: 'UTC', workdays: [1, 2, 3, 4, 5], minutesPerDay: 480, entered: false, today: '2026-12-01' });
    expect(res.body.calendar.caution).toMatch(/local codes/);
    expect((await machinist.get('/api/line/calendar')).status).toBe(403);
    expect((await machinist.put('/api/line/calendar').send(nairobiSixDays)).status).toBe(403);
  });

  it('answers a 400 naming the field for an unknown time zone, a shift ending before it starts, or a break as long as the shift', async () => {
    const zone = await owner.put('/api/line/calendar').send({ ...nairobiSixDays, timeZone: 'Mars/Olympus_Mons' });
    expect(zone.status).toBe(400);
    expect(zone.body.error.fields.timeZone).toMatch(/time zone/);
    const shift = await owner.put('/api/line/calendar').send({ ...nairobiSixDays, shiftStart: '17:00', shiftEnd: '08:00' });
    expect(shift.body.error.fields.shiftEnd).toBe('The shift must end after it starts');
    const pause = await owner.put('/api/line/calendar').send({ ...nairobiSixDays, shiftStart: '08:00', shiftEnd: '09:00', breakMinutes: 60 });
    expect(pause.body.error.fields.breakMinutes).toBeTruthy();
    const day7 = await owner.put('/api/line/calendar').send({ ...nairobiSixDays, workdays: [1, 7] });
    expect(day7.body.error.fields['workdays.1']).toBe('Days are 0 (Sunday) to 6 (Saturday)');
    expect((await owner.get('/api/line/calendar')).body.calendar.entered).toBe(false);
  });

  it('schedules on Saturdays and skips the holidays entered, with 8 paid hours a day', async () => {
    const saved = await owner.put('/api/line/calendar').send(nairobiSixDays);
    expect(saved.status).toBe(200);
    expect(saved.body.calendar).toMatchObject({ minutesPerDay: 480, hoursPerWeek: 48, entered: true, exceedsIlo: false });
    const plan = (await owner.get('/api/line/batches/1/plan?start=2026-12-07')).body.plan;
    expect(plan.workdays).toEqual([1, 2, 3, 4, 5, 6]);
    expect(plan.minutesPerDay).toBe(480);
    const days = plan.plannedOutput.map((d: { day: string }) => d.day);
    expect(days).toContain('2026-12-19'); // a Saturday
    expect(days).not.toContain('2026-12-12'); // a Saturday entered as a holiday
    expect(days.every((d: string) => new Date(`${d}T00:00:00Z`).getUTCDay() !== 0)).toBe(true);
  });

  it('counts the studio’s today in its own time zone, not in UTC', async () => {
    await owner.put('/api/line/calendar').send({ ...nairobiSixDays, timeZone: 'Pacific/Honolulu' });
    expect((await owner.get('/api/line/calendar')).body.calendar.today).toBe('2026-11-30');
    expect((await owner.get('/api/floor/attendance')).body.day).toBe('2026-11-30');
    const plan = (await owner.get('/api/line/batches/1/plan')).body.plan;
    // The schedule starts on the first working day after the studio's today (1 Dec there, not 2 Dec as in UTC).
    expect(plan.start).toBe('2026-12-01');
  });
});
