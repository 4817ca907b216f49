import { addDays, format } from 'date-fns';
import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/auth/permissions';
import { hashSecret } from '../auth/password';
import { presetComposition } from '../../shared/schemas/style-composition';
import { BatchEntity, StudioEntity, StyleEntity, UserEntity } from '../entities';
import { seedCosting } from './costing.seed';
import { seedCutting } from './cutting.seed';
import { seedFloor } from './floor.seed';
import { seedGrading } from './grading.seed';
import { seedLine } from './line.seed';
import { seedLinedDress } from './lined-dress.seed';
import type { SeedContext } from './seed-context';

/** Area seeders in dependency order: pieces → fabric, markers, cut plan → line → floor → costing. */
const AREA_SEEDS: ((ctx: SeedContext) => Promise<void>)[] = [seedGrading, seedCutting, seedLine, seedFloor, seedCosting, seedLinedDress];

/** Our own invented demo people; none is a real person. */
export const DEMO_PEOPLE: { email: string; name: string; role: Role; pin?: string }[] = [
  { email: 'owner@tamarind.example', name: 'Zawadi Kerubo', role: 'owner' },
  { email: 'cutter@tamarind.example', name: 'Baraka Otieno', role: 'cutter' },
  { email: 'machinist1@tamarind.example', name: 'Achieng Mwende', role: 'machinist', pin: '11' },
  { email: 'machinist2@tamarind.example', name: 'Neema Chebet', role: 'machinist', pin: '12' },
  { email: 'machinist3@tamarind.example', name: 'Imani Wairimu', role: 'machinist', pin: '13' },
  { email: 'machinist4@tamarind.example', name: 'Faraji Kiprop', role: 'machinist', pin: '14' },
  { email: 'machinist5@tamarind.example', name: 'Subira Nafula', role: 'machinist', pin: '15' },
  { email: 'machinist6@tamarind.example', name: 'Jabari Mutua', role: 'machinist', pin: '16' },
  { email: 'finisher1@tamarind.example', name: 'Makena Atieno', role: 'finisher', pin: '21' },
  { email: 'finisher2@tamarind.example', name: 'Tumaini Wafula', role: 'finisher', pin: '22' },
];

export const DEMO_QUANTITIES = { XS: 4, S: 8, M: 12, L: 10, XL: 6 };

export interface SeedOptions {
  password: string;
  pinPrefix: string;
  today: Date;
  /** Budget of each seeded marker, in seconds. */
  nestingSeconds?: number;
}

/** PIN of a demo floor worker: the prefix then their two digits, e.g. 4011. */
export const demoPin = (prefix: string, suffix: string) => `${prefix}${suffix}`;

/** Seed Tamarind Row Studio when the database has no studio yet. Returns false if it did nothing. */
export async function seedDemoStudio(ds: DataSource, opts: SeedOptions): Promise<boolean> {
  if ((await ds.getRepository(StudioEntity).count()) > 0) return false;
  const passwordHash = await hashSecret(opts.password);
  const ids = await ds.transaction(async (m) => {
    const studio = await m.getRepository(StudioEntity).save({
      name: 'Tamarind Row Studio',
      currency: 'KES',
      unitSystem: 'metric',
      workingDayHours: 8,
    });
    for (const p of DEMO_PEOPLE) {
      await m.getRepository(UserEntity).save({
        studioId: studio.id,
        name: p.name,
        email: p.email,
        role: p.role,
        passwordHash,
        pinHash: p.pin ? await hashSecret(demoPin(opts.pinPrefix, p.pin)) : null,
        active: true,
      });
    }
    const style = await m.getRepository(StyleEntity).save({
      studioId: studio.id,
      code: 'SR-101',
      name: 'Sable shirt dress',
      description:
        'A-line shirt dress with short set-in sleeves, button front on a collar band, two patch pockets and a self belt.',
      sizeRun: ['XS', 'S', 'M', 'L', 'XL'],
      baseSize: 'M',
      status: 'approved',
      composition: presetComposition('shirt-dress'),
    });
    const batch = await m.getRepository(BatchEntity).save({
      studioId: studio.id,
      number: 1, // the new studio's first batch: B-0001
      styleId: style.id,
      quantities: DEMO_QUANTITIES,
      dueDate: format(addDays(opts.today, 21), 'yyyy-MM-dd'),
      status: 'planned',
      notes: 'First ready-to-wear run of the Sable shirt dress.',
    });
    const owner = await m.getRepository(UserEntity).findOneByOrFail({ email: DEMO_PEOPLE[0].email });
    return { studioId: studio.id, styleId: style.id, batchId: batch.id, ownerId: owner.id };
  });
  const ctx: SeedContext = { ds, ...ids, today: opts.today, nestingSeconds: opts.nestingSeconds ?? 4 };
  for (const seed of AREA_SEEDS) await seed(ctx);
  return true;
}
