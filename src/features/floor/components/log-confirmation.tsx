import { useEffect, useState } from 'react';
import type { LogWorkResult } from '@shared/schemas/floor';
import { formatMoney } from '@/lib/format';

/** What was logged and what it pays, with undo while the window is open. */
export function LogConfirmation({ result, onUndo, undoing }: { result: LogWorkResult; onUndo: () => void; undoing: boolean }) {
  const { log, warnings } = result;
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    const t = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(t);
  }, []);
  const left = Math.max(0, Math.round((new Date(log.undoUntil).getTime() - now) / 1000));
  return (
    <div role="status" aria-label="Logged" className="space-y-2 rounded-card border border-thread-700/30 bg-thread-700/10 p-4">
      <p className="text-lg font-bold text-thread-800">✓ Logged</p>
      <p className="text-base">
        Bundle <strong>{log.bundleNumber}</strong> · {log.operationCode} {log.operationName}
      </p>
      <p className="text-base">
        <strong>{log.pieces}</strong> pieces · pays <strong>{formatMoney(log.payMinor, log.currency)}</strong>
        {log.attempt > 0 ? ' (rework: paid the first time)' : ''}
      </p>
      {log.outcome === 'fail' ? <p className="text-sm text-madder-700">Failed: {log.defect}. Sent back for rework.</p> : null}
      {warnings.length ? (
        <ul className="rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700" aria-label="Warnings">
          {warnings.map((w) => <li key={w}>⚠ {w}</li>)}
        </ul>
      ) : null}
      {left > 0 && log.outcome !== 'fail' ? (
        <button type="button" className="btn-quiet w-full" disabled={undoing} onClick={onUndo}>
          Undo ({Math.floor(left / 60)}:{String(left % 60).padStart(2, '0')} left)
        </button>
      ) : null}
    </div>
  );
}
