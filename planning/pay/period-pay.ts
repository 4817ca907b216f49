import { RATE_SCALE, rateMillionths, roundHalfUp } from './exact-rate';

/** Work to pay: pieces of an operation at an exact rate (decimal minor units per piece). First attempts only. */
export interface PayWork {
  personId: string;
  operationId: string;
  pieces: number;
  /** Decimal text, minor units per piece, at most 6 decimals ("0.125"). */
  rate: string;
}

/** Minutes a person attended on a day (`yyyy-MM-dd`, the studio's own day). Whole minutes. */
export interface PayAttendance {
  personId: string;
  day: string;
  minutes: number;
}

/** The studio's pay rules for a period; each is off when null. Seamrun defers to local law for the values. */
export interface PayRules {
  /** Minimum wage per hour, decimal minor units; when set, a person paid less for their attended hours is topped up. */
  minimumHourlyMinor: string | null;
  /** Premium on overtime minutes, % of the person's regular hourly rate (25 = paid 1.25 × in all). */
  overtimePremiumPercent: number | null;
}

/** Input to {@link computePeriodPay}. */
export interface PeriodPayInput {
  work: PayWork[];
  attendance: PayAttendance[];
  /** Scheduled (calendar) minutes per day of the period; a day not listed is not a working day (all its minutes are overtime). */
  scheduledMinutes: Record<string, number>;
  rules: PayRules;
}

/** One pay line: a person's pieces of one operation at one rate, Σ pieces × rate rounded once. */
export interface PiecePayLine {
  operationId: string;
  rate: string;
  pieces: number;
  amountMinor: number;
}

/** One person's pay for the period, in minor units. */
export interface PersonPeriodPay {
  personId: string;
  pieces: number;
  lines: PiecePayLine[];
  /** Σ of the piece lines. */
  pieceMinor: number;
  attendedMinutes: number;
  /** Σ over days of attended minutes beyond the day's scheduled minutes. */
  overtimeMinutes: number;
  /** Overtime premium: overtime hours × regular hourly rate × premium %, rounded once. */
  overtimeMinor: number;
  /** Minimum pay for the attended hours (attended hours × minimum hourly, rounded once); null when the rule is off. */
  minimumMinor: number | null;
  /** What brings the piece pay up to the minimum: max(0, minimum − piece pay). */
  topUpMinor: number;
  /** pieceMinor + overtimeMinor + topUpMinor. */
  totalMinor: number;
}

const byText = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

/**
 * Pay of a period per person, in exact arithmetic (millionths of a minor unit, bigint), each amount rounded once
 * with {@link roundHalfUp} (to the nearest minor unit, halves up):
 *
 * - piece lines: one per person × operation × rate, Σ pieces × rate rounded once (never per log, so 8 logs of one
 *   piece at 0.125 pay 1, not 0);
 * - overtime: each day's attended minutes beyond its scheduled minutes (all of them on a day off). The premium is
 *   overtime hours × the regular hourly rate × premium %, the regular rate being piece pay ÷ attended hours, or the
 *   minimum hourly when that is higher and the rule is on (the pieces made in overtime are already paid at their
 *   rate: this adds the premium part only);
 * - minimum-wage top-up: max(0, attended hours × minimum hourly − piece pay); the premium does not count towards it.
 *
 * People sorted by id, lines by operation id then rate. Same input, same output: a re-run pays the same.
 * Throws RangeError for a rate that is not a decimal of at most 6 places, negative pieces or minutes.
 */
export function computePeriodPay(input: PeriodPayInput): PersonPeriodPay[] {
  const hourly = input.rules.minimumHourlyMinor == null ? null : rateMillionths(input.rules.minimumHourlyMinor);
  if (input.rules.minimumHourlyMinor != null && hourly == null) throw new RangeError('minimum hourly rate must be a decimal of at most 6 places');
  const premium = input.rules.overtimePremiumPercent;
  if (premium != null && !(Number.isInteger(premium) && premium >= 0 && premium <= 1000)) throw new RangeError('overtime premium must be a whole percentage 0–1000');

  const people = new Set<string>();
  const lines = new Map<string, { personId: string; operationId: string; rate: string; pieces: number; millionths: bigint }>();
  for (const w of input.work) {
    if (!(Number.isInteger(w.pieces) && w.pieces >= 0)) throw new RangeError(`pieces must be a whole number ≥ 0 (${w.operationId})`);
    const rate = rateMillionths(w.rate);
    if (rate == null) throw new RangeError(`rate of ${w.operationId} must be a decimal of at most 6 places`);
    people.add(w.personId);
    const key = `${w.personId}\u0000${w.operationId}\u0000${rate}`;
    const line = lines.get(key) ?? { personId: w.personId, operationId: w.operationId, rate: w.rate, pieces: 0, millionths: 0n };
    line.pieces += w.pieces;
    line.millionths += BigInt(w.pieces) * rate;
    lines.set(key, line);
  }
  const attended = new Map<string, number>();
  const overtime = new Map<string, number>();
  const perDay = new Map<string, number>();
  for (const a of input.attendance) {
    if (!(Number.isInteger(a.minutes) && a.minutes >= 0)) throw new RangeError(`attended minutes must be a whole number ≥ 0 (${a.personId} ${a.day})`);
    people.add(a.personId);
    const key = `${a.personId}\u0000${a.day}`;
    perDay.set(key, (perDay.get(key) ?? 0) + a.minutes);
  }
  for (const [key, minutes] of perDay) {
    const [personId, day] = key.split('\u0000');
    attended.set(personId, (attended.get(personId) ?? 0) + minutes);
    overtime.set(personId, (overtime.get(personId) ?? 0) + Math.max(0, minutes - (input.scheduledMinutes[day] ?? 0)));
  }

  return [...people].sort(byText).map((personId): PersonPeriodPay => {
    const mine = [...lines.values()].filter((l) => l.personId === personId).sort((a, b) => byText(a.operationId, b.operationId) || (rateMillionths(a.rate)! < rateMillionths(b.rate)! ? -1 : 1));
    const pieceLines = mine.map((l) => ({ operationId: l.operationId, rate: l.rate, pieces: l.pieces, amountMinor: Number(roundHalfUp(l.millionths, RATE_SCALE)) }));
    const pieceMinor = pieceLines.reduce((a, l) => a + l.amountMinor, 0);
    const pieceExact = mine.reduce((a, l) => a + l.millionths, 0n);
    const minutes = attended.get(personId) ?? 0;
    const otMinutes = overtime.get(personId) ?? 0;
    const minimumMinor = hourly == null ? null : Number(roundHalfUp(BigInt(minutes) * hourly, 60n * RATE_SCALE));
    const topUpMinor = minimumMinor == null ? 0 : Math.max(0, minimumMinor - pieceMinor);
    let overtimeMinor = 0;
    if (premium && otMinutes > 0 && minutes > 0) {
      // Regular rate per minute as a fraction rNum / rDen (millionths): piece pay ÷ minutes, or hourly ÷ 60 if higher.
      let rNum = pieceExact;
      let rDen = BigInt(minutes);
      if (hourly != null && hourly * rDen > rNum * 60n) {
        rNum = hourly;
        rDen = 60n;
      }
      overtimeMinor = Number(roundHalfUp(BigInt(otMinutes) * rNum * BigInt(premium), rDen * 100n * RATE_SCALE));
    }
    return {
      personId,
      pieces: pieceLines.reduce((a, l) => a + l.pieces, 0),
      lines: pieceLines,
      pieceMinor,
      attendedMinutes: minutes,
      overtimeMinutes: otMinutes,
      overtimeMinor,
      minimumMinor,
      topUpMinor,
      totalMinor: pieceMinor + overtimeMinor + topUpMinor,
    };
  });
}
