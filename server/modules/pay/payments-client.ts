import Stripe from 'stripe';

/** What a transfer attempt came to. `definitive: false` means no answer: retry with the same key. */
export type TransferOutcome =
  | { ok: true; id: string }
  | { ok: false; definitive: boolean; message: string };

export interface TransferRequest {
  amountMinor: number;
  currency: string;
  destination: string;
  description: string;
  idempotencyKey: string;
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
          { amount: r.amountMinor, currency: r.currency.toLowerCase(), destination: r.destination, description: r.description },
          { idempotencyKey: r.idempotencyKey },
        );
        return { ok: true, id: t.id };
      } catch (e) {
        const err = e as { type?: string; message?: string; statusCode?: number };
        // Refusals (4xx) are final for this key; connection errors and 5xx may or may not have paid.
        const definitive = typeof err.statusCode === 'number' && err.statusCode >= 400 && err.statusCode < 500 && err.statusCode !== 409 && err.statusCode !== 429;
        return { ok: false, definitive, message: err.message ?? 'Payment failed' };
      }
    },
  };
}

export type PaymentsClient = ReturnType<typeof createPaymentsClient>;
