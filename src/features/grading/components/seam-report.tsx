import type { GradingDto, GradingErrorDto } from '@shared/schemas/grading';
import { Badge } from '@/components/ui/page';
import { useTranslation } from '@/lib/i18n';
import { useLength } from '../hooks/use-length';
import { usePatternNames } from '../hooks/use-pattern-names';
import { area } from '../words';

/** Seams sewn together, per size: both lengths, the difference against the intended ease, pass or error. */
export function SeamReport({ grading }: { grading: GradingDto }) {
  const { t, i18n } = useTranslation();
  const pn = usePatternNames();
  const { small, len } = useLength();
  const names = [...new Set(grading.seams.map((s) => s.seam))];
  /** A problem the check found, in the person's language and units where its kind is known (else as the server said it). */
  const sentence = (e: GradingErrorDto): string => {
    if (i18n.language === 'en') return e.message;
    if (e.code === 'seam_mismatch') {
      const c = grading.seams.find((x) => x.size === e.size && !x.ok && e.message.startsWith(`${x.seam}, size `));
      if (c) return t(`${area}.seamReport.mismatch`, { seam: pn.seam(c.seam), size: c.size, off: small(c.differenceMm - c.expectedMm), allowed: small(c.toleranceMm) });
    }
    if ((e.code === 'winding_flipped' || e.code === 'self_intersection') && e.pieceId && e.size) {
      const piece = grading.pieces.find((p) => p.id === e.pieceId);
      return t(`${area}.seamReport.${e.code === 'winding_flipped' ? 'flipped' : 'crosses'}`, { piece: pn.piece(piece?.name ?? e.pieceId), size: e.size });
    }
    return e.message;
  };
  return (
    <div className="space-y-3">
      {grading.errors.length ? (
        <ul role="alert" className="space-y-1 rounded-lg bg-madder-100 px-3 py-2 text-sm text-madder-700">
          {grading.errors.map((e, i) => <li key={i}>{sentence(e)}</li>)}
        </ul>
      ) : grading.pieces.length === 0 ? (
        <p className="text-sm text-ink-600">{t(`${area}.seamReport.nothing`)}</p>
      ) : (
        <p className="text-sm text-thread-800"><Badge tone="teal">{t(`${area}.seamReport.allClear`)}</Badge> {t(`${area}.seamReport.allClearText`)}</p>
      )}
      <div role="region" aria-label={t(`${area}.seamReport.region`)} tabIndex={0} className="overflow-x-auto">
        <table className="w-full min-w-[560px] text-sm" data-testid="seam-report">
          <thead><tr className="border-b border-calico-200 text-left text-ink-600"><th className="py-1.5 pr-2">{t(`${area}.seamReport.seam`)}</th>{grading.sizes.map((s) => <th key={s} className="px-2">{s}</th>)}</tr></thead>
          <tbody>
            {names.map((n) => (
              <tr key={n} className="border-b border-calico-100 align-top">
                <td className="py-1.5 pr-2 font-medium">{pn.seam(n)}</td>
                {grading.sizes.map((size) => {
                  const c = grading.seams.find((x) => x.seam === n && x.size === size);
                  if (!c) return <td key={size} />;
                  return (
                    <td key={size} className="px-2 py-1.5" title={t(`${area}.seamReport.cellTitle`, { a: len(c.lengthAMm), b: len(c.lengthBMm), expected: small(c.expectedMm), tolerance: small(c.toleranceMm) })}>
                      <Badge tone={c.ok ? 'teal' : 'red'}>{c.ok ? t(`${area}.seamReport.ok`) : t(`${area}.seamReport.error`)}</Badge>
                      <div className="text-xs text-ink-600">{small(c.differenceMm)}</div>
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-600">{t(`${area}.seamReport.note`)}</p>
    </div>
  );
}
