import type { SeedContext } from './seed-context';

/** Demo data of the costing area for Tamarind Row Studio. */
export async function seedCosting(_ctx: SeedContext): Promise<void> {}
