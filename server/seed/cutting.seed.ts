import type { SeedContext } from './seed-context';

/** Demo data of the cutting area for Tamarind Row Studio. */
export async function seedCutting(_ctx: SeedContext): Promise<void> {}
