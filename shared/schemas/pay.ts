import { z } from 'zod';
import { calendarDate } from './common';

/** Approve piece-rate pay for the days from `fromDay` to `toDay`, both included (UTC days). */
export const approvePayPeriodInput = z
  .object({ fromDay: calendarDate, toDay: calendarDate })
  .refine((v) => v.fromDay <= v.toDay, { path: ['toDay'], message: 'The end must not be before the start' });
export type ApprovePayPeriodInput = z.infer<typeof approvePayPeriodInput>;

export const payPersonInput = z.object({ userId: z.number({ error: 'Pick a person' }).int().positive('Pick a person') });

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
  id: number;
  fromDay: string;
  toDay: string;
  status: 'approved' | 'paid';
  approvedBy: string;
  createdAt: string;
  currency: string;
  totalMinor: number;
  lines: { userId: number; name: string; pieces: number; amountMinor: number }[];
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
