import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { backupDatabase } from '../../server/db/backup';
import { openDatabase } from '../../server/db/data-source';
import { restoreDatabase } from '../../server/db/restore';

const dir = mkdtempSync(join(tmpdir(), 'seamrun-backup-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

// The online backup is SQLite's own API; a PostgreSQL host uses pg_dump instead.
describe.skipIf(Boolean(process.env.TEST_DATABASE_URL))('backup and restore', () => {
  it('round-trips a consistent backup while writes go on', async () => {
    const live = join(dir, 'live.sqlite');
    const ds = await openDatabase(live);
    await ds.query(`INSERT INTO studios (name, currency, unitSystem, workingDayHours) VALUES ('Before', 'KES', 'metric', 8)`);
    let writes = 0;
    let writing = true;
    const writer = (async () => {
      while (writing) {
        await ds.query(`INSERT INTO audit_entries (studioId, action, entity) VALUES (1, 'log', 'bundle')`);
        writes++;
        await new Promise((r) => setImmediate(r));
      }
    })();
    await new Promise((r) => setTimeout(r, 50));
    const backup = await backupDatabase(live, join(dir, 'backup.sqlite'));
    writing = false;
    await writer;
    expect(writes).toBeGreaterThan(0);
    const copy = new Database(backup, { readonly: true });
    const inBackup = (copy.prepare('SELECT COUNT(*) AS n FROM audit_entries').get() as { n: number }).n;
    copy.close();
    expect(inBackup).toBeLessThanOrEqual(writes);
    await ds.destroy();

    await restoreDatabase(backup, join(dir, 'restored.sqlite'));
    const restored = new Database(join(dir, 'restored.sqlite'), { readonly: true });
    expect((restored.pragma('integrity_check') as { integrity_check: string }[])[0].integrity_check).toBe('ok');
    expect((restored.prepare('SELECT name FROM studios').get() as { name: string }).name).toBe('Before');
    expect((restored.prepare('SELECT COUNT(*) AS n FROM audit_entries').get() as { n: number }).n).toBe(inBackup);
    restored.close();
  });
});
