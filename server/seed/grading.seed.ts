import type { SeedContext } from './seed-context';

/** Demo data of the grading area for Tamarind Row Studio. */
export async function seedGrading(_ctx: SeedContext): Promise<void> {}
