import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import Database from 'better-sqlite3';

/** One transfer the fake accepted. */
export interface FakeTransfer {
  id: string;
  amount: number;
  currency: string;
  destination: string;
  description: string;
  transferGroup: string;
  idempotencyKey: string;
}

interface Answer {
  status: number;
  body: unknown;
  replay?: boolean;
}

const SCHEMA = `
CREATE TABLE IF NOT EXISTS idempotency_keys (key TEXT PRIMARY KEY, params TEXT NOT NULL, status INTEGER NOT NULL, body TEXT NOT NULL);
CREATE TABLE IF NOT EXISTS transfers (seq INTEGER PRIMARY KEY AUTOINCREMENT, id TEXT NOT NULL UNIQUE, amount INTEGER NOT NULL,
  currency TEXT NOT NULL, destination TEXT NOT NULL, description TEXT NOT NULL, transfer_group TEXT NOT NULL, idempotency_key TEXT NOT NULL);
`;

/**
 * A local stand-in for the hosted payments service: POST /v1/transfers honouring the Idempotency-Key header
 * (the same key returns the first answer and never makes a second transfer; the same key with other
 * parameters is refused, as the real service does) and GET /v1/transfers?transfer_group=… to find what was
 * paid. Keys and transfers live in their own SQLite file (`path`; ':memory:' keeps them for this process
 * only), so a restart remembers them as the live service does. It can refuse transfers to an account, or
 * take a transfer and lose the answer, so the failure paths can be tried. No money moves.
 */
export function createPaymentsFake(opts: { path?: string } = {}) {
  const path = opts.path ?? ':memory:';
  const failing = new Map<string, string>();
  let db: Database.Database | null = null;
  let server: Server | null = null;
  let answersToLose = 0;

  const open = () => {
    if (!db) {
      db = new Database(path);
      db.pragma('busy_timeout = 5000');
      db.exec(SCHEMA);
    }
    return db;
  };

  const readBody = (req: IncomingMessage) =>
    new Promise<string>((resolve, reject) => {
      let data = '';
      req.setEncoding('utf8');
      req.on('data', (c: string) => (data += c));
      req.on('end', () => resolve(data));
      req.on('error', reject);
    });

  const refusal = (status: number, type: string, code: string, message: string): Answer => ({ status, body: { error: { type, code, message } } });

  function transfer(params: URLSearchParams, key: string): Answer {
    const amount = Number(params.get('amount'));
    const destination = params.get('destination') ?? '';
    const currency = (params.get('currency') ?? '').toLowerCase();
    if (!Number.isInteger(amount) || amount <= 0 || !destination || !currency) {
      return refusal(400, 'invalid_request_error', 'parameter_missing', 'amount, currency and destination are required');
    }
    const reason = failing.get(destination);
    if (reason) return refusal(400, 'invalid_request_error', 'account_invalid', reason);
    const d = open();
    const seq = (d.prepare('SELECT COALESCE(MAX(seq), 0) + 1 AS n FROM transfers').get() as { n: number }).n;
    const t: FakeTransfer = {
      id: `tr_fake_${seq}_${Math.random().toString(36).slice(2, 8)}`,
      amount,
      currency,
      destination,
      description: params.get('description') ?? '',
      transferGroup: params.get('transfer_group') ?? '',
      idempotencyKey: key,
    };
    d.prepare('INSERT INTO transfers (id, amount, currency, destination, description, transfer_group, idempotency_key) VALUES (?, ?, ?, ?, ?, ?, ?)').run(
      t.id, t.amount, t.currency, t.destination, t.description, t.transferGroup, t.idempotencyKey,
    );
    return { status: 200, body: presentTransfer(t) };
  }

  const presentTransfer = (t: FakeTransfer) => ({
    id: t.id, object: 'transfer', amount: t.amount, currency: t.currency, destination: t.destination, description: t.description,
    transfer_group: t.transferGroup || null, livemode: false, created: 0, metadata: {},
  });

  function list(query: URLSearchParams): Answer {
    const group = query.get('transfer_group');
    const rows = listTransfers().filter((t) => group === null || t.transferGroup === group);
    return { status: 200, body: { object: 'list', url: '/v1/transfers', has_more: false, data: rows.reverse().map(presentTransfer) } };
  }

  /** Checks the key, then transfers and stores the answer with it, in one SQLite transaction. */
  function post(params: URLSearchParams, key: string): Answer {
    if (!key) return transfer(params, '');
    const d = open();
    return d.transaction((): Answer => {
      const seen = d.prepare('SELECT params, status, body FROM idempotency_keys WHERE key = ?').get(key) as { params: string; status: number; body: string } | undefined;
      if (seen) {
        if (seen.params !== params.toString()) {
          return refusal(400, 'idempotency_error', 'idempotency_key_reused', 'Keys for idempotent requests can only be used with the same parameters they were first used with.');
        }
        return { status: seen.status, body: JSON.parse(seen.body), replay: true };
      }
      const result = transfer(params, key);
      d.prepare('INSERT INTO idempotency_keys (key, params, status, body) VALUES (?, ?, ?, ?)').run(key, params.toString(), result.status, JSON.stringify(result.body));
      return result;
    })();
  }

  async function handle(req: IncomingMessage): Promise<Answer> {
    const [route, search = ''] = (req.url ?? '').split('?');
    if (route === '/v1/transfers' && req.method === 'GET') return list(new URLSearchParams(search));
    if (route !== '/v1/transfers' || req.method !== 'POST') {
      return refusal(404, 'invalid_request_error', 'resource_missing', `Unrecognized request URL (${req.method} ${req.url})`);
    }
    return post(new URLSearchParams(await readBody(req)), String(req.headers['idempotency-key'] ?? ''));
  }

  function respond(req: IncomingMessage, res: ServerResponse, a: Answer) {
    if (req.method === 'POST' && answersToLose > 0) {
      // The transfer is made and its key stored, but the answer never reaches the caller.
      answersToLose -= 1;
      res.socket?.destroy();
      return;
    }
    res.writeHead(a.status, { 'content-type': 'application/json', 'request-id': `req_fake_${Date.now()}`, ...(a.replay ? { 'idempotent-replayed': 'true' } : {}) });
    res.end(JSON.stringify(a.body));
  }

  function listTransfers(): FakeTransfer[] {
    const rows = open().prepare('SELECT * FROM transfers ORDER BY seq').all() as Record<string, string | number>[];
    return rows.map((r) => ({
      id: String(r.id), amount: Number(r.amount), currency: String(r.currency), destination: String(r.destination),
      description: String(r.description), transferGroup: String(r.transfer_group), idempotencyKey: String(r.idempotency_key),
    }));
  }

  return {
    /** Every transfer made so far, oldest first (read from the fake's file). */
    get transfers() {
      return listTransfers();
    },
    /** Refuse transfers to `account` with `reason` until cleared. */
    failFor(account: string, reason = 'This account cannot receive transfers') {
      failing.set(account, reason);
    },
    clearFailures() {
      failing.clear();
    },
    /** Make the next `n` transfer requests, then drop the connection before answering (a lost answer). */
    loseAnswers(n: number) {
      answersToLose = n;
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
      open();
      const s = createServer((req, res) => {
        handle(req)
          .then((a) => respond(req, res, a))
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
    /** Stop listening and close the file; a new fake on the same file remembers every key. */
    async stop() {
      const s = server;
      server = null;
      if (s) {
        s.closeAllConnections();
        await new Promise((r) => s.close(r));
      }
      db?.close();
      db = null;
    },
  };
}

export type PaymentsFake = ReturnType<typeof createPaymentsFake>;
