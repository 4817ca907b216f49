import type { SeedContext } from './seed-context';

/** Demo data of the floor area for Tamarind Row Studio. */
export async function seedFloor(_ctx: SeedContext): Promise<void> {}
