import { describe, expect, it } from 'vitest';
import { cutPlanFabricId } from './cutting-format';

describe('the fabric the cut plan form opens on', () => {
  // Fabrics listed alphabetically: 6 Champagne lining, 5 Emerald crepe (self), 8 Fusible interfacing.
  const listed = [6, 5, 8];

  it('shows the fabric of the plan on screen, not the first fabric of the list', () => {
    expect(cutPlanFabricId(8, 5, listed)).toBe(8);
  });

  it('opens on the style’s self fabric when the batch has no plan yet', () => {
    expect(cutPlanFabricId(undefined, 5, listed)).toBe(5);
  });

  it('falls back to the first fabric when neither is known or still listed', () => {
    expect(cutPlanFabricId(undefined, undefined, listed)).toBe(6);
    expect(cutPlanFabricId(99, 98, listed)).toBe(6);
    expect(cutPlanFabricId(undefined, undefined, [])).toBeUndefined();
  });
});
