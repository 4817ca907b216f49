import { runCpuTask } from '../../jobs/cpu-pool';
import type { StyleRepository } from '../styles/style.repository';
import type { CuttingPieceSource } from './graded-pieces';
import type { GradingSetRepository } from './grading-set.repository';

/**
 * The one place that loads a style's cutting pieces: its stored grading set graded over the run, as
 * {@link cuttingPiecesOf} does, on the CPU pool's threads (grading and offsetting every piece of every size
 * is CPU work). A style without a grading set gives `{}`; an unknown style gives `{}` too (the caller decides
 * what is missing).
 */
export function createCuttingPieceSource(deps: { styles: Pick<StyleRepository, 'get'>; sets: Pick<GradingSetRepository, 'byStyle'> }): CuttingPieceSource {
  return async (studioId, styleId) => {
    const style = await deps.styles.get(studioId, styleId);
    if (!style) return {};
    const set = await deps.sets.byStyle(studioId, styleId);
    if (!set || !set.sizeChart) return {};
    return runCpuTask('cutting-pieces', { set: { sizeChart: set.sizeChart, pieces: set.pieces, gradeRules: set.gradeRules }, baseSize: style.baseSize });
  };
}
