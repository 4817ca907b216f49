import { z } from 'zod';
import { calendarDate } from './common';

/** Approve piece-rate pay for the days from `fromDay` to `toDay`, both included (UTC days). */
export const approvePayPeriodInput = z
  .object({ fromDay: calendarDate, toDay: calendarDate })
  .refine((v) => v.fromDay <= v.toDay, { path: ['toDay'], message: 'The end must not be before the start' });
export type ApprovePayPeriodInput = z.infer<typeof approvePayPeriodInput>;

export const payPersonInput = z.object({ userId: z.number({ error: 'Pick a person' }).int().positive('Pick a person') });

/** Text shown wherever the studio sets or sees minimum-wage and overtime figures. */
export const PAY_RULES_CAUTION =
  'Seamrun works with the figures you enter; it does not know the law where you work. Minimum wages, overtime premiums, the hours that count and how often you must pay are set by local law and agreements: check them with your labour office or an adviser, and follow them first.';

/** PUT /pay/rules: the studio's minimum-wage top-up and overtime premium. */
export const payRulesInput = z
  .object({
    minimumWageOn: z.boolean(),
    /** Minor units per hour, up to 6 decimals; required when the top-up is on. */
    minimumHourlyMinor: z
      .number({ error: 'Give an amount per hour' })
      .finite()
      .min(0, 'Cannot be negative')
      .max(1e12, 'Too large')
      .refine((v) => /^\d+(\.\d{1,6})?$/.test(String(v)), 'At most 6 decimals of a minor unit')
      .nullable()
      .default(null),
    overtimePremiumPercent: z.number({ error: 'Give a percentage' }).int('Whole percent only').min(0, 'Cannot be negative').max(300, 'At most 300 %'),
  })
  .refine((v) => !v.minimumWageOn || (v.minimumHourlyMinor != null && v.minimumHourlyMinor > 0), { path: ['minimumHourlyMinor'], message: 'Enter the minimum wage per hour to turn the top-up on' });
export type PayRulesInput = z.input<typeof payRulesInput>;

export interface PayRulesDto {
  minimumWageOn: boolean;
  minimumHourlyMinor: number | null;
  overtimePremiumPercent: number;
  currency: string;
  caution: string;
}

/** A person's line of an approved period. The parts are absent on periods approved before pay rules. */
export interface PayPeriodLine {
  userId: number;
  name: string;
  pieces: number;
  /** What the person is paid: piece pay + overtime premium + top-up. */
  amountMinor: number;
  pieceMinor?: number;
  overtimeMinor?: number;
  topUpMinor?: number;
  attendedMinutes?: number;
  overtimeMinutes?: number;
}

/** The rules a period was approved with (frozen): minimum hourly (decimal text or null), premium %, scheduled minutes per day. */
export interface PayPeriodRules {
  minimumHourlyMinor: string | null;
  overtimePremiumPercent: number;
  scheduledMinutes: Record<string, number>;
}

export const payoutParams = z.object({ id: z.coerce.number().int().positive() });

/** One person's pay in a period: pieces × rate per operation, summed; rework is not paid again. */
export interface PayPersonLine {
  userId: number;
  name: string;
  pieces: number;
  amountMinor: number;
  earnedMinutes: number;
  attendedMinutes: number;
  efficiencyPercent: number | null;
  /** Piece pay (each operation line rounded once), overtime premium and minimum-wage top-up; amountMinor is their sum. */
  pieceMinor: number;
  overtimeMinor: number;
  topUpMinor: number;
  overtimeMinutes: number;
  /** rateMinor: exact minor units per piece, may be fractional (0.125). */
  operations: { code: string; name: string; pieces: number; rateMinor: number; amountMinor: number }[];
}

export interface PayPreviewDto {
  fromDay: string;
  toDay: string;
  currency: string;
  people: PayPersonLine[];
  totalMinor: number;
  /** An approved period already covering some of these days. */
  overlapsPeriodId: number | null;
  /** That period's number in the studio, as people know it. */
  overlapsPeriodNumber: number | null;
  /** Logs made on already-approved days after their approval, paid in this period instead. */
  carriedLogs: number;
}

/**
 * pending: being sent; paid; failed: the payments service refused and paid nothing; to_check: no clear
 * answer, it may have paid (never retried with a new key; Pay asks the service first).
 */
export type PayoutStatus = 'pending' | 'paid' | 'failed' | 'to_check';

export interface PayoutDto {
  id: number;
  userId: number;
  name: string;
  amountMinor: number;
  currency: string;
  status: PayoutStatus;
  providerRef: string;
  error: string;
  attempts: number;
  updatedAt: string;
}

export interface PayPeriodDto {
  /** For URLs and API calls only. */
  id: number;
  /** The period's number in its studio, 1 for the studio's first: what people call it. */
  number: number;
  fromDay: string;
  toDay: string;
  status: 'approved' | 'paid';
  approvedBy: string;
  createdAt: string;
  currency: string;
  totalMinor: number;
  lines: PayPeriodLine[];
  payouts: PayoutDto[];
}

export interface PayModeDto {
  /** No secret key: payments go to the local fake and no money moves. */
  testMode: boolean;
  message: string;
}

export interface MyPayDto {
  fromDay: string;
  toDay: string;
  currency: string;
  pieces: number;
  amountMinor: number;
  operations: { code: string; name: string; pieces: number; amountMinor: number }[];
}
