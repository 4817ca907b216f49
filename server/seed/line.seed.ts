import { OperationEntity } from '../entities';
import type { SeedContext } from './seed-context';

type Op = [code: string, name: string, section: OperationEntity['section'], machineType: string, sam: number, predecessors: string[], rateKes: number];

/**
 * Operation breakdown of the demo "Sable shirt dress", written by Seamrun. The minutes are DEMO ESTIMATES for a
 * small studio, not published standard times; piece rates are demo figures in KES (stored in minor units, cents).
 * Codes OP01… are stable: the floor area reads these rows by code.
 */
export const DEMO_OPERATIONS: Op[] = [
  ['OP01', 'Spread and cut shell parts', 'cutting', 'cutting', 4.0, [], 20],
  ['OP02', 'Bundle and ticket cut parts', 'cutting', 'hand work', 1.0, ['OP01'], 5],
  ['OP03', 'Fuse collar band and facings (fusing press, cutting room)', 'cutting', 'pressing', 1.2, ['OP02'], 8],
  ['OP04', 'Hem pocket tops and press pocket edges', 'sewing', 'lockstitch', 1.5, ['OP02'], 10],
  ['OP05', 'Attach patch pockets to fronts', 'sewing', 'lockstitch', 2.4, ['OP04'], 15],
  ['OP06', 'Join shoulder seams', 'sewing', 'overlock', 0.9, ['OP02'], 8],
  ['OP07', 'Join facing shoulders and neaten facing edges', 'sewing', 'overlock', 1.1, ['OP03'], 8],
  ['OP08', 'Attach facings to front edges and back neck', 'sewing', 'lockstitch', 2.2, ['OP06', 'OP07'], 15],
  ['OP09', 'Make collar band', 'sewing', 'lockstitch', 1.6, ['OP03'], 12],
  ['OP10', 'Attach collar band to neckline', 'sewing', 'lockstitch', 2.0, ['OP08', 'OP09'], 15],
  ['OP11', 'Set sleeves', 'sewing', 'lockstitch', 2.6, ['OP06'], 18],
  ['OP12', 'Neaten armhole seams', 'sewing', 'overlock', 1.0, ['OP11'], 8],
  ['OP13', 'Close side and underarm seams', 'sewing', 'overlock', 1.8, ['OP05', 'OP12'], 12],
  ['OP14', 'Hem sleeves', 'sewing', 'lockstitch', 1.2, ['OP13'], 8],
  ['OP15', 'Hem dress', 'sewing', 'lockstitch', 2.0, ['OP10', 'OP13'], 12],
  ['OP16', 'Make belt and belt loops', 'sewing', 'lockstitch', 1.8, ['OP02'], 12],
  ['OP17', 'Buttonholes on front and collar band', 'sewing', 'buttonhole', 1.4, ['OP15'], 15],
  ['OP18', 'Sew buttons', 'sewing', 'button sew', 1.2, ['OP17'], 12],
  ['OP19', 'Trim threads', 'finishing', 'hand work', 1.5, ['OP14', 'OP16', 'OP18'], 5],
  ['OP20', 'Final press', 'finishing', 'pressing', 2.5, ['OP19'], 12],
  ['OP21', 'Inspect and measure against the spec', 'finishing', 'inspection', 1.5, ['OP20'], 8],
  ['OP22', 'Fold, tag and bag', 'finishing', 'hand work', 1.0, ['OP21'], 5],
];

/** Demo data of the line area for Tamarind Row Studio: the demo style's operation breakdown. */
export async function seedLine(ctx: SeedContext): Promise<void> {
  const repo = ctx.ds.getRepository(OperationEntity);
  await repo.save(
    DEMO_OPERATIONS.map(([code, name, section, machineType, sam, predecessors, rateKes], i) =>
      repo.create({ studioId: ctx.studioId, styleId: ctx.styleId, seq: i + 1, code, name, section, machineType, sam, predecessors, pieceRateMinor: rateKes * 100 }),
    ),
  );
}
