import { execSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { measureFirstLoad, type FirstLoad } from '../bench/first-load.bench';

// Issue 21: the script a cheap phone fetches before its first screen. The e2e build runs under
// NODE_ENV=test (React's development build), so this measures its own production build.
describe('first load', () => {
  const outDir = mkdtempSync(join(tmpdir(), 'seamrun-first-load-'));
  let r: FirstLoad;
  beforeAll(() => {
    execSync(`npx vite build --logLevel warn --emptyOutDir --outDir ${outDir}`, {
      stdio: 'inherit',
      env: { ...process.env, NODE_ENV: 'production' },
    });
    r = measureFirstLoad(outDir);
  });
  afterAll(() => rmSync(outDir, { recursive: true, force: true }));

  it('keeps the entry script and its preloaded chunks within 200 kB gzipped when the client is built', () => {
    expect(r.files.length).toBeGreaterThan(0);
    expect(r.gzipBytes).toBeLessThanOrEqual(r.budgetGzipBytes);
  });

  it('loads the charts, the QR decoder and the owner screens only when first used when the client is built', () => {
    for (const later of [/jsqr/i, /line-charts|line-page/, /owner-home/, /markers-page/, /floor-home/]) {
      expect(r.laterChunks.some((k) => later.test(k)), String(later)).toBe(true);
      expect(r.chunks.some((k) => later.test(k)), String(later)).toBe(false);
    }
  });
});
