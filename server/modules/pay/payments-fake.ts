import { createServer, type IncomingMessage, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';

/** One transfer the fake accepted. */
export interface FakeTransfer {
  id: string;
  amount: number;
  currency: string;
  destination: string;
  description: string;
  idempotencyKey: string;
}

interface Stored {
  status: number;
  body: unknown;
  params: string;
}

/**
 * A local stand-in for the hosted payments service: just POST /v1/transfers, honouring the Idempotency-Key
 * header (the same key returns the first answer and never makes a second transfer; the same key with other
 * parameters is refused, as the real service does). It can be told to refuse transfers to an account, so the
 * failure path can be tried. No money moves.
 */
export function createPaymentsFake() {
  const byKey = new Map<string, Stored>();
  const failing = new Map<string, string>();
  const transfers: FakeTransfer[] = [];
  let server: Server | null = null;
  let seq = 0;

  const readBody = (req: IncomingMessage) =>
    new Promise<string>((resolve, reject) => {
      let data = '';
      req.setEncoding('utf8');
      req.on('data', (c: string) => (data += c));
      req.on('end', () => resolve(data));
      req.on('error', reject);
    });

  function transfer(params: URLSearchParams, key: string): Stored {
    const amount = Number(params.get('amount'));
    const destination = params.get('destination') ?? '';
    const currency = (params.get('currency') ?? '').toLowerCase();
    const raw = params.toString();
    if (!Number.isInteger(amount) || amount <= 0 || !destination || !currency) {
      return { status: 400, params: raw, body: { error: { type: 'invalid_request_error', code: 'parameter_missing', message: 'amount, currency and destination are required' } } };
    }
    const reason = failing.get(destination);
    if (reason) return { status: 400, params: raw, body: { error: { type: 'invalid_request_error', code: 'account_invalid', message: reason } } };
    const t: FakeTransfer = { id: `tr_fake_${++seq}`, amount, currency, destination, description: params.get('description') ?? '', idempotencyKey: key };
    transfers.push(t);
    return { status: 200, params: raw, body: { id: t.id, object: 'transfer', amount, currency, destination, livemode: false, created: 0, metadata: {} } };
  }

  async function handle(req: IncomingMessage): Promise<{ status: number; body: unknown; replay?: boolean }> {
    if (req.method !== 'POST' || req.url?.split('?')[0] !== '/v1/transfers') {
      return { status: 404, body: { error: { type: 'invalid_request_error', message: `Unrecognized request URL (${req.method} ${req.url})` } } };
    }
    const params = new URLSearchParams(await readBody(req));
    const key = String(req.headers['idempotency-key'] ?? '');
    if (!key) return transfer(params, '');
    const seen = byKey.get(key);
    if (seen) {
      if (seen.params !== params.toString()) {
        return { status: 400, body: { error: { type: 'idempotency_error', message: 'Keys for idempotent requests can only be used with the same parameters they were first used with.' } } };
      }
      return { ...seen, replay: true };
    }
    const result = transfer(params, key);
    byKey.set(key, result);
    return result;
  }

  return {
    transfers,
    /** Refuse transfers to `account` with `reason` until cleared. */
    failFor(account: string, reason = 'This account cannot receive transfers') {
      failing.set(account, reason);
    },
    clearFailures() {
      failing.clear();
    },
    get port() {
      return (server?.address() as AddressInfo | null)?.port ?? 0;
    },
    get running() {
      return server !== null;
    },
    /** Listen on loopback; port 0 picks a free one (read it from `port`). */
    async start(port = 0) {
      if (server) return;
      const s = createServer((req, res) => {
        handle(req)
          .then(({ status, body, replay }) => {
            res.writeHead(status, { 'content-type': 'application/json', 'request-id': `req_fake_${Date.now()}`, ...(replay ? { 'idempotent-replayed': 'true' } : {}) });
            res.end(JSON.stringify(body));
          })
          .catch(() => {
            res.writeHead(500).end();
          });
      });
      await new Promise<void>((resolve, reject) => {
        s.once('error', reject);
        s.listen(port, '127.0.0.1', () => resolve());
      });
      s.unref();
      server = s;
    },
    async stop() {
      const s = server;
      server = null;
      if (s) await new Promise((r) => s.close(r));
    },
  };
}

export type PaymentsFake = ReturnType<typeof createPaymentsFake>;
