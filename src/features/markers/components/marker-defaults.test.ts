import { describe, expect, it } from 'vitest';
import { markerFabricId } from './marker-defaults';

describe('the fabric a new marker starts on', () => {
  it('is the cut plan’s fabric when the batch has a plan, not the first fabric listed', () => {
    expect(markerFabricId(5, [6, 5, 8])).toBe(5);
  });

  it('is the first fabric without a plan, or when the plan’s fabric is gone', () => {
    expect(markerFabricId(undefined, [6, 5, 8])).toBe(6);
    expect(markerFabricId(99, [6, 5, 8])).toBe(6);
    expect(markerFabricId(undefined, [])).toBeUndefined();
  });
});
