import Stripe from 'stripe';

/**
 * What a transfer attempt came to. `definitive: true` only when the service answered with a refusal that
 * means nothing was paid; anything else (no answer, 5xx, 409, 429, a key reused with other parameters) may
 * have paid and must be checked, never called failed.
 */
export type TransferOutcome =
  | { ok: true; id: string }
  | { ok: false; definitive: boolean; message: string };

export interface TransferRequest {
  amountMinor: number;
  currency: string;
  destination: string;
  description: string;
  /** Groups every attempt of one payout, so the service can be asked later what was paid. */
  transferGroup: string;
  idempotencyKey: string;
}

/** What the service holds for a transfer group: the transfer, none, or no answer. */
export type LookupOutcome = { ok: true; id: string | null } | { ok: false; message: string };

/** True when the service's answer is a refusal that made no transfer. */
function isDefinitiveRefusal(err: { type?: string; rawType?: string; statusCode?: number }) {
  if (err.type === 'StripeIdempotencyError' || err.rawType === 'idempotency_error') return false;
  const s = err.statusCode;
  return typeof s === 'number' && s >= 400 && s < 500 && s !== 409 && s !== 429;
}

/**
 * The payments service through its official Node SDK. With a secret key it talks to the real service;
 * without one it points the SDK's host, port and protocol at the local fake (test mode, no money moves).
 */
export function createPaymentsClient(opts: { secretKey: string; fakePort: () => Promise<number> }) {
  const testMode = !opts.secretKey;
  let sdk: Stripe | null = null;
  async function client() {
    if (sdk) return sdk;
    sdk = testMode
      ? new Stripe('sk_test_seamrun_local_fake', { host: '127.0.0.1', port: await opts.fakePort(), protocol: 'http', maxNetworkRetries: 1, timeout: 10_000, telemetry: false })
      : new Stripe(opts.secretKey, { maxNetworkRetries: 2, timeout: 20_000, telemetry: false });
    return sdk;
  }
  return {
    testMode,
    async transfer(r: TransferRequest): Promise<TransferOutcome> {
      try {
        const t = await (await client()).transfers.create(
          { amount: r.amountMinor, currency: r.currency.toLowerCase(), destination: r.destination, description: r.description, transfer_group: r.transferGroup },
          { idempotencyKey: r.idempotencyKey },
        );
        return { ok: true, id: t.id };
      } catch (e) {
        const err = e as { type?: string; rawType?: string; message?: string; statusCode?: number };
        return { ok: false, definitive: isDefinitiveRefusal(err), message: err.message ?? 'Payment failed' };
      }
    },
    /** Ask the service which transfer, if any, it made for a group (the reconciliation after an unclear answer). */
    async findTransfer(transferGroup: string): Promise<LookupOutcome> {
      try {
        const page = await (await client()).transfers.list({ transfer_group: transferGroup, limit: 10 });
        return { ok: true, id: page.data[0]?.id ?? null };
      } catch (e) {
        return { ok: false, message: (e as Error).message ?? 'No answer' };
      }
    },
  };
}

export type PaymentsClient = ReturnType<typeof createPaymentsClient>;
