import { describe, expect, it } from 'vitest';
import { checkLayout, type NestingInput } from '@planning';
import { mm } from '@shared/units/units';
import { runNestingSearch } from './nesting-search';

// Twelve 3 × 2 rectangles on a strip 10 wide: area 72, so no marker is shorter than 7.2 (computed).
const input: NestingInput = { stripWidth: mm(10), pieces: [{ id: 'r', polygon: [{ x: 0, y: 0 }, { x: 3, y: 0 }, { x: 3, y: 2 }, { x: 0, y: 2 }], quantity: 12 }] };

describe('runNestingSearch', { timeout: 60_000 }, () => {
  it('runs on the lanes asked for, gives one up on request and keeps a valid marker', async () => {
    const lanesSeen: number[] = [];
    const handle = runNestingSearch(input, { seed: 1, timeBudgetMs: 2500, overrunMs: 30_000, lanes: 2, onProgress: (p) => lanesSeen.push(p.lanes) });
    expect(handle.lanes()).toBe(2);
    await new Promise((r) => setTimeout(r, 1200));
    handle.setLanes(1);
    expect(handle.lanes()).toBe(1);
    const outcome = await handle.done;
    expect(outcome.kind).toBe('result');
    if (outcome.kind !== 'result') return;
    expect(outcome.cancelled).toBe(false);
    expect(outcome.result.complete).toBe(true);
    expect(outcome.result.length).toBeGreaterThanOrEqual(7.2 - 1e-9);
    expect(checkLayout(input, outcome.result).errors).toEqual([]);
    expect(lanesSeen.length).toBeGreaterThan(0);
  });

  it('stops every lane on cancel and says the marker was cut short', async () => {
    const handle = runNestingSearch(input, { seed: 3, timeBudgetMs: 20_000, overrunMs: 30_000, lanes: 2 });
    await new Promise((r) => setTimeout(r, 1500));
    handle.cancel();
    const outcome = await handle.done;
    expect(['result', 'cancelled']).toContain(outcome.kind);
    if (outcome.kind === 'result') {
      expect(outcome.cancelled).toBe(true);
      expect(checkLayout(input, outcome.result).errors).toEqual([]);
    }
  });
});
