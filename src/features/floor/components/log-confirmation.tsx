import { useEffect, useState } from 'react';
import type { LogWorkResult } from '@shared/schemas/floor';
import { Trans } from 'react-i18next';
import { formatMoney } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';

/** What was logged and what it pays, with undo while the window is open. */
export function LogConfirmation({ result, onUndo, undoing }: { result: LogWorkResult; onUndo: () => void; undoing: boolean }) {
  const { t } = useTranslation();
  const { log, warnings } = result;
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const t = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(t);
  }, []);
  const left = Math.max(0, Math.round((new Date(log.undoUntil).getTime() - now) / 1000));
  return (
    <div role="status" aria-label={t('floor.logged')} className="space-y-2 rounded-card border border-thread-700/30 bg-thread-700/10 p-4">
      <p className="text-lg font-bold text-thread-800">{t('floor.logged')}</p>
      <p className="text-base">
        <Trans i18nKey="floor.loggedWhat" values={{ number: log.bundleNumber, op: `${log.operationCode} ${log.operationName}` }} components={{ b: <strong /> }} />
      </p>
      <p className="text-base">
        <Trans i18nKey="floor.pays" values={{ pieces: t('common.pieces', { count: log.pieces }), pay: formatMoney(log.payMinor, log.currency) }} components={{ b: <strong /> }} />
        {log.attempt > 0 ? t('floor.reworkPaid') : ''}
      </p>
      {log.outcome === 'fail' ? <p className="text-sm text-madder-700">{t('floor.failed', { defect: log.defect })}</p> : null}
      {warnings.length ? (
        <ul className="rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700" aria-label={t('floor.warnings')}>
          {warnings.map((w) => <li key={w}>⚠ {w}</li>)}
        </ul>
      ) : null}
      {left > 0 && log.outcome !== 'fail' ? (
        <button type="button" className="btn-quiet w-full" disabled={undoing} onClick={onUndo}>
          {t('floor.undo', { left: `${Math.floor(left / 60)}:${String(left % 60).padStart(2, '0')}` })}
        </button>
      ) : null}
    </div>
  );
}
