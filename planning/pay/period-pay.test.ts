import { describe, expect, it } from 'vitest';
import { formatRate, rateMillionths, roundHalfUp } from './exact-rate';
import { computePeriodPay, type PayRules } from './period-pay';

const off: PayRules = { minimumHourlyMinor: null, overtimePremiumPercent: null };
const week = (minutes: number) => Object.fromEntries(['2026-12-07', '2026-12-08', '2026-12-09', '2026-12-10', '2026-12-11'].map((d) => [d, minutes]));

describe('exact piece rates', () => {
  it('keeps 0.125 minor units exactly and writes it back the same when parsed from text or a number', () => {
    expect(rateMillionths('0.125')).toBe(125_000n);
    expect(rateMillionths(0.125)).toBe(125_000n);
    expect(formatRate(125_000n)).toBe('0.125');
    expect(formatRate(12_000_000n)).toBe('12');
    expect(rateMillionths('0.0000001')).toBeNull();
    expect(rateMillionths('-1')).toBeNull();
    expect(rateMillionths('1e3')).toBeNull();
  });

  it('rounds halves up and everything else to the nearest unit', () => {
    expect(roundHalfUp(5n, 10n)).toBe(1n);
    expect(roundHalfUp(4n, 10n)).toBe(0n);
    expect(roundHalfUp(15n, 10n)).toBe(2n);
    expect(roundHalfUp(0n, 7n)).toBe(0n);
  });
});

describe('computePeriodPay', () => {
  it('pays 8 single-piece logs at 0.125 one minor unit when the line is rounded once, not 0 as per-log rounding would', () => {
    // 8 × 0.125 = 1 exactly (hand arithmetic); rounding each log's 0.125 would pay 0.
    const work = Array.from({ length: 8 }, () => ({ personId: 'p1', operationId: 'hem', pieces: 1, rate: '0.125' }));
    const [p] = computePeriodPay({ work, attendance: [], scheduledMinutes: {}, rules: off });
    expect(p.lines).toEqual([{ operationId: 'hem', rate: '0.125', pieces: 8, amountMinor: 1 }]);
    expect(p.totalMinor).toBe(1);
  });

  it('rounds a line of 4 pieces at 0.125 (0.5) up to 1 and of 3 pieces (0.375) down to 0', () => {
    const pay = computePeriodPay({
      work: [{ personId: 'a', operationId: 'hem', pieces: 4, rate: '0.125' }, { personId: 'b', operationId: 'hem', pieces: 3, rate: '0.125' }],
      attendance: [], scheduledMinutes: {}, rules: off,
    });
    expect(pay.map((p) => p.pieceMinor)).toEqual([1, 0]);
  });

  it('keeps two rates of one operation on two lines when the rate changed within the period', () => {
    const [p] = computePeriodPay({
      work: [{ personId: 'a', operationId: 'hem', pieces: 10, rate: '12' }, { personId: 'a', operationId: 'hem', pieces: 10, rate: '12.5' }],
      attendance: [], scheduledMinutes: {}, rules: off,
    });
    expect(p.lines.map((l) => [l.rate, l.amountMinor])).toEqual([['12', 120], ['12.5', 125]]);
  });

  it('tops a person up to the minimum for their attended hours when the rule is on, and not when it is off', () => {
    // 40 h × 150 minor units an hour = 6000; piece pay 5000 → top-up 1000 (hand arithmetic).
    const attendance = Object.keys(week(480)).map((day) => ({ personId: 'a', day, minutes: 480 }));
    const work = [{ personId: 'a', operationId: 'side', pieces: 250, rate: '20' }];
    const [on] = computePeriodPay({ work, attendance, scheduledMinutes: week(480), rules: { minimumHourlyMinor: '150', overtimePremiumPercent: null } });
    expect(on).toMatchObject({ pieceMinor: 5000, minimumMinor: 6000, topUpMinor: 1000, totalMinor: 6000 });
    const [offRule] = computePeriodPay({ work, attendance, scheduledMinutes: week(480), rules: off });
    expect(offRule).toMatchObject({ minimumMinor: null, topUpMinor: 0, totalMinor: 5000 });
  });

  it('adds no top-up when piece pay is above the minimum', () => {
    const [p] = computePeriodPay({
      work: [{ personId: 'a', operationId: 'side', pieces: 400, rate: '20' }],
      attendance: [{ personId: 'a', day: '2026-12-07', minutes: 480 }],
      scheduledMinutes: week(480), rules: { minimumHourlyMinor: '150', overtimePremiumPercent: null },
    });
    expect(p.topUpMinor).toBe(0);
  });

  it('pays the half-time premium on 10 overtime hours of a piece worker who earned 491.00 in 50 hours', () => {
    // US Department of Labor, 29 CFR 778.111 (piece-rate regular rate: total piece earnings ÷ hours worked, overtime
    // hours paid an extra half of that rate): $491 ÷ 50 h = $9.82; 10 h × $4.91 = $49.10; $540.10 in all. From memory,
    // not a strict oracle: the figures are checked within one cent. Five 10-hour days against an 8-hour calendar.
    const attendance = Object.keys(week(480)).map((day) => ({ personId: 'a', day, minutes: 600 }));
    const [p] = computePeriodPay({
      work: [{ personId: 'a', operationId: 'all', pieces: 491, rate: '100' }],
      attendance, scheduledMinutes: week(480), rules: { minimumHourlyMinor: null, overtimePremiumPercent: 50 },
    });
    expect(p.overtimeMinutes).toBe(600);
    expect(Math.abs(p.overtimeMinor - 4910)).toBeLessThanOrEqual(1);
    expect(Math.abs(p.totalMinor - 54010)).toBeLessThanOrEqual(1);
  });

  it('counts every minute of a day off as overtime and prices it at the minimum hourly when that is higher', () => {
    // Saturday not in the calendar: 120 min overtime. Piece pay 100 for 600 min is 10 an hour; minimum 150 an hour
    // is higher, so the 25 % premium (ILO C1 Art. 6(2): overtime at least 1.25 × the regular rate) is 2 h × 150 × 0.25 = 75.
    const [p] = computePeriodPay({
      work: [{ personId: 'a', operationId: 'hem', pieces: 10, rate: '10' }],
      attendance: [{ personId: 'a', day: '2026-12-11', minutes: 480 }, { personId: 'a', day: '2026-12-12', minutes: 120 }],
      scheduledMinutes: week(480), rules: { minimumHourlyMinor: '150', overtimePremiumPercent: 25 },
    });
    expect(p.overtimeMinutes).toBe(120);
    expect(p.overtimeMinor).toBe(75);
    expect(p.minimumMinor).toBe(1500);
    expect(p.topUpMinor).toBe(1400);
    expect(p.totalMinor).toBe(100 + 75 + 1400);
  });

  it('computes the same lines when the work and attendance come in another order', () => {
    const work = [
      { personId: 'b', operationId: 'hem', pieces: 3, rate: '0.125' },
      { personId: 'a', operationId: 'side', pieces: 7, rate: '2.333333' },
      { personId: 'a', operationId: 'hem', pieces: 5, rate: '0.125' },
    ];
    const attendance = [{ personId: 'a', day: '2026-12-07', minutes: 500 }, { personId: 'b', day: '2026-12-07', minutes: 300 }];
    const rules = { minimumHourlyMinor: '1.5', overtimePremiumPercent: 25 };
    const one = computePeriodPay({ work, attendance, scheduledMinutes: week(480), rules });
    const two = computePeriodPay({ work: [...work].reverse(), attendance: [...attendance].reverse(), scheduledMinutes: week(480), rules });
    expect(two).toEqual(one);
  });

  it('refuses a rate with more than 6 decimals and pays nobody for an empty period', () => {
    expect(() => computePeriodPay({ work: [{ personId: 'a', operationId: 'hem', pieces: 1, rate: '0.1234567' }], attendance: [], scheduledMinutes: {}, rules: off })).toThrow(RangeError);
    expect(computePeriodPay({ work: [], attendance: [], scheduledMinutes: {}, rules: off })).toEqual([]);
  });
});
