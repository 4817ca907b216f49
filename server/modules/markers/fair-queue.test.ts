import { describe, expect, it } from 'vitest';
import { FairQueue } from './fair-queue';

const drain = <T>(q: FairQueue<T>) => {
  const out: string[] = [];
  for (let n = q.shift(); n; n = q.shift()) out.push(`${n.studioId}:${String(n.item)}`);
  return out;
};

describe('FairQueue', () => {
  it('serves studios in turn and each studio first in, first out when one studio queued many first', () => {
    const q = new FairQueue<string>();
    for (const item of ['a1', 'a2', 'a3']) q.push(1, item);
    q.push(2, 'b1');
    q.push(3, 'c1');
    expect(q.countOf(1)).toBe(3);
    expect(q.size).toBe(5);
    expect(drain(q)).toEqual(['1:a1', '2:b1', '3:c1', '1:a2', '1:a3']);
    expect(q.size).toBe(0);
  });

  it('drops a studio from the turn order when its last waiting item is removed', () => {
    const q = new FairQueue<string>();
    q.push(1, 'a1');
    q.push(2, 'b1');
    expect(q.remove((i) => i === 'a1')).toBe(true);
    expect(q.remove((i) => i === 'zz')).toBe(false);
    q.push(1, 'a2');
    expect(drain(q)).toEqual(['2:b1', '1:a2']);
  });
});
