import type { SeedContext } from './seed-context';

/** Demo data of the line area for Tamarind Row Studio. */
export async function seedLine(_ctx: SeedContext): Promise<void> {}
