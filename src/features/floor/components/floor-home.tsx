import { useQuery } from '@tanstack/react-query';
import { useCallback, useEffect, useState, type FormEvent } from 'react';
import type { LogWorkResult } from '@shared/schemas/floor';
import { Card, ErrorNote, PageHeader } from '@/components/ui/page';
import { api, ApiError } from '@/lib/api-client';
import { useMe } from '@/lib/auth';
import { useTranslation } from '@/lib/i18n';
import { queryClient } from '@/lib/query-client';
import { floorQueries } from '../api/floor-queries';
import { flushOutbox, newIdempotencyKey, othersWaiting, sendLog, waitingFor } from '../lib/outbox';
import { BundleLogPanel, type LogChoice } from './bundle-log-panel';
import { LogConfirmation } from './log-confirmation';
import { QrScanner } from './qr-scanner';
import { ReworkCard } from './rework-card';
import { TodayCard } from './today-card';

/**
 * Logs waiting on the phone; the signed-in person's are sent again when the network is back and every
 * 15 s. Logs someone else made on this phone stay until that person signs in here.
 */
function useOutbox(userId: number | undefined) {
  const { t } = useTranslation();
  const count = () => (userId ? waitingFor(userId).length : 0);
  const others = () => (userId ? othersWaiting(userId) : []);
  const [mine, setMine] = useState(count);
  const [theirs, setTheirs] = useState(others);
  const [note, setNote] = useState('');
  useEffect(() => {
    if (!userId) return;
    const update = () => {
      setMine(waitingFor(userId).length);
      setTheirs(othersWaiting(userId));
    };
    const flush = async () => {
      if (!waitingFor(userId).length) return;
      const r = await flushOutbox(userId);
      if (r.sent) setNote(t('floor.sent', { count: r.sent }));
      if (r.refused.length) setNote(t('floor.refused', { reasons: r.refused.join('; ') }));
      if (r.sent || r.refused.length) await queryClient.invalidateQueries({ queryKey: floorQueries.all().queryKey });
    };
    update();
    window.addEventListener('seamrun-outbox', update);
    window.addEventListener('online', flush);
    const timer = setInterval(flush, 15_000);
    void flush();
    return () => {
      window.removeEventListener('seamrun-outbox', update);
      window.removeEventListener('online', flush);
      clearInterval(timer);
    };
  }, [userId, t]);
  return { count: mine, others: theirs, note };
}

/** The machinist's and finisher's phone home: find a bundle, log an operation, see today's count. */
export function FloorHome({ name }: { name: string }) {
  const { t } = useTranslation();
  const me = useMe().data;
  const [typed, setTyped] = useState('');
  const [target, setTarget] = useState<{ bundleNumber: number; batchId?: number } | null>(null);
  const [scanning, setScanning] = useState(false);
  const [result, setResult] = useState<LogWorkResult | null>(null);
  const [queued, setQueued] = useState('');
  const [error, setError] = useState<unknown>(null);
  const [busy, setBusy] = useState(false);
  const outbox = useOutbox(me?.id);
  const bundle = useQuery({ ...floorQueries.bundle(target?.bundleNumber ?? 0, target?.batchId), enabled: Boolean(target) });
  // A typed number two batches share (bundles cut before numbers were studio-wide) is never guessed: pick the batch.
  const isAmbiguous = Boolean(target && !target.batchId && bundle.error instanceof ApiError && bundle.error.status === 409);
  const choices = useQuery({ ...floorQueries.matches(target?.bundleNumber ?? 0), enabled: isAmbiguous });

  const handleFind = (e: FormEvent) => {
    e.preventDefault();
    const n = Number(typed);
    if (!Number.isInteger(n) || n < 1) return setError(new Error(t('floor.typeNumber')));
    setError(null);
    setResult(null);
    setQueued('');
    setTarget({ bundleNumber: n });
  };

  const handleScanned = useCallback((v: { batchId: number; bundleNumber: number }) => {
    setScanning(false);
    setTyped(String(v.bundleNumber));
    setResult(null);
    setQueued('');
    setError(null);
    setTarget(v);
  }, []);

  const handleLog = async (choice: LogChoice) => {
    if (!bundle.data || !me) return;
    setBusy(true);
    setError(null);
    const input = { bundleNumber: bundle.data.number, batchId: bundle.data.batchId, idempotencyKey: newIdempotencyKey(me.id), ...choice };
    const op = bundle.data.operations.find((o) => o.id === choice.operationId);
    try {
      const r = await sendLog(input, t('floor.todayLog', { number: bundle.data.number, op: op?.code ?? '' }), { id: me.id, name: me.name });
      if (r.kind === 'sent') setResult(r.result);
      else setQueued(t('floor.queued', { number: bundle.data.number, op: `${op?.code} ${op?.name}` }));
      await queryClient.invalidateQueries({ queryKey: floorQueries.all().queryKey });
    } catch (e) {
      setError(e);
    } finally {
      setBusy(false);
    }
  };

  const handleUndo = async () => {
    if (!result) return;
    setBusy(true);
    try {
      await api.del(`/floor/logs/${result.log.id}`);
      setResult(null);
      await queryClient.invalidateQueries({ queryKey: floorQueries.all().queryKey });
    } catch (e) {
      setError(e);
    } finally {
      setBusy(false);
    }
  };

  return (
    <div className="mx-auto max-w-md space-y-4">
      <PageHeader title={t('floor.hello', { name: name.split(' ')[0] })} subtitle={t('floor.subtitle')} />
      {outbox.count ? (
        <p role="status" className="rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700">
          {t('floor.waiting', { count: outbox.count })}
        </p>
      ) : null}
      {outbox.others.map((o) => (
        <p key={o.key} role="status" className="rounded-lg bg-calico-100 px-3 py-2 text-sm text-ink-600">
          {t('floor.waitingFor', { count: o.count, name: o.name })}
        </p>
      ))}
      {outbox.note ? <p className="rounded-lg bg-calico-50 px-3 py-2 text-sm">{outbox.note}</p> : null}
      <ReworkCard onOpen={(code) => handleScanned(code)} />
      <Card title={t('floor.findCard')}>
        {scanning ? (
          <QrScanner onBundle={handleScanned} onClose={() => setScanning(false)} />
        ) : (
          <div className="space-y-3">
            <button type="button" className="btn-accent w-full py-3 text-base" onClick={() => setScanning(true)}>
              {t('floor.scan')}
            </button>
            <form onSubmit={handleFind} className="flex items-end gap-2">
              <div className="flex-1">
                <label className="field-label" htmlFor="bundle-number">{t('floor.bundleNumber')}</label>
                <input id="bundle-number" className="field-input text-lg" inputMode="numeric" pattern="[0-9]*" autoComplete="off" value={typed} onChange={(e) => setTyped(e.target.value.replace(/\D/g, ''))} />
              </div>
              <button type="submit" className="btn-primary py-2.5">{t('floor.find')}</button>
            </form>
          </div>
        )}
      </Card>
      <ErrorNote error={error ?? (bundle.error && target ? bundle.error : null)} />
      {isAmbiguous && choices.data && target ? (
        <Card title={t('floor.whichBundle', { number: target.bundleNumber })}>
          <p className="mb-3 text-sm text-ink-600">{t('floor.ambiguous')}</p>
          <div className="grid gap-2">
            {choices.data.map((c) => (
              <button
                key={c.batchId}
                type="button"
                className="btn-quiet w-full justify-start py-3 text-left"
                onClick={() => setTarget({ bundleNumber: c.number, batchId: c.batchId })}
              >
                {t('floor.choice', { batch: c.batchCode, style: c.styleName, size: c.size })}
              </button>
            ))}
          </div>
        </Card>
      ) : null}
      {queued ? <p role="status" className="rounded-lg bg-saffron-100 px-3 py-2 text-sm text-saffron-700">{queued}</p> : null}
      {result ? <LogConfirmation result={result} onUndo={handleUndo} undoing={busy} /> : null}
      {bundle.data && target ? (
        <Card>
          <BundleLogPanel key={`${bundle.data.id}-${bundle.dataUpdatedAt}`} bundle={bundle.data} busy={busy} onLog={handleLog} />
        </Card>
      ) : null}
      <TodayCard />
    </div>
  );
}
