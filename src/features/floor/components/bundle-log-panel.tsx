import { useState } from 'react';
import type { BundleDto, FloorOperationDto, LogWorkInput } from '@shared/schemas/floor';
import { Caution } from '@/components/ui/page';
import { fmt } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { onlyOpenOfMine } from '../lib/operation-choice';
import { area } from '../words';

export type LogChoice = Pick<LogWorkInput, 'operationId' | 'outcome' | 'defect' | 'reworkOperationId'>;

function OperationOption({ op, state, selected, onSelect }: { op: FloorOperationDto; state?: BundleDto['states'][number]; selected: boolean; onSelect: () => void }) {
  const { t } = useTranslation();
  return (
    <label className={`flex cursor-pointer items-center gap-3 rounded-lg border px-3 py-3 ${selected ? 'border-thread-700 bg-thread-700/10' : 'border-calico-200 bg-white'} ${state?.done ? 'opacity-70' : ''}`}>
      <input type="radio" name="operation" className="h-5 w-5 accent-thread-700" checked={selected} onChange={onSelect} aria-label={`${op.code} ${op.name}`} />
      <span className="flex-1">
        <span className="font-medium">{op.code} {op.name}</span>
        <span className="block text-xs text-ink-600">
          {t('floor.opFacts', { section: t(`${area}.sections.${op.section}`), machine: op.machineType, sam: fmt().number(op.sam, 2) })}
          {state?.attempt ? ` · ${t('floor.rework', { attempt: state.attempt })}` : ''}
        </span>
      </span>
      {state?.done ? <span className="text-xs text-ink-600">{t('floor.doneBy', { name: state.doneBy })}</span> : null}
    </label>
  );
}

/** Pick the operation done on this bundle (yours first) and log it; a quality check passes or fails. */
export function BundleLogPanel({ bundle, busy, onLog }: { bundle: BundleDto; busy: boolean; onLog: (c: LogChoice) => void }) {
  const { t } = useTranslation();
  const stateOf = (id: number) => bundle.states.find((s) => s.operationId === id);
  // Pay follows the operation logged: nothing is chosen for the machinist unless exactly one of their own
  // operations is still open on this bundle, and an operation once logged does not stay chosen.
  const [opId, setOpId] = useState<number | undefined>(() => onlyOpenOfMine(bundle));
  const [outcome, setOutcome] = useState<'pass' | 'fail'>('pass');
  const [defect, setDefect] = useState('');
  const [rework, setRework] = useState<number | undefined>();
  const op = bundle.operations.find((o) => o.id === opId);
  // Open work first, done work last, each in the style's order.
  const byOpen = (a: FloorOperationDto, b: FloorOperationDto) => Number(Boolean(stateOf(a.id)?.done)) - Number(Boolean(stateOf(b.id)?.done));
  const mine = bundle.operations.filter((o) => o.isMine).sort(byOpen);
  const others = bundle.operations.filter((o) => !o.isMine);
  const canLog = op && (!op.isCheck || outcome === 'pass' || (defect.trim() && rework));

  const handleLog = () => {
    if (!op) return;
    onLog(op.isCheck ? { operationId: op.id, outcome, ...(outcome === 'fail' ? { defect: defect.trim(), reworkOperationId: rework } : {}) } : { operationId: op.id });
    setOpId(undefined);
  };

  return (
    <div className="space-y-3">
      <div className="rounded-lg bg-calico-50 p-3 text-sm" aria-label={t('floor.bundle')}>
        <p className="text-lg font-bold text-thread-800">{t('floor.bundleTitle', { number: bundle.number, size: bundle.size })}</p>
        <p>{t('floor.bundleFacts', { pieces: t('common.pieces', { count: bundle.pieces }), shade: bundle.shadeLot, from: bundle.plyFrom, to: bundle.plyTo })}</p>
        <p className="text-ink-600">{bundle.batchCode} · {bundle.styleName}</p>
      </div>
      <fieldset className="space-y-2">
        <legend className="field-label">{mine.length ? t('floor.yourOperations') : t('floor.operations')}</legend>
        {(mine.length ? mine : others).map((o) => (
          <OperationOption key={o.id} op={o} state={stateOf(o.id)} selected={o.id === opId} onSelect={() => setOpId(o.id)} />
        ))}
        {mine.length && others.length ? (
          <details className="rounded-lg border border-calico-200 bg-white p-2">
            <summary className="cursor-pointer text-sm font-medium text-thread-800">{t('floor.otherOperations', { count: others.length })}</summary>
            <div className="mt-2 space-y-2">
              {others.map((o) => (
                <OperationOption key={o.id} op={o} state={stateOf(o.id)} selected={o.id === opId} onSelect={() => setOpId(o.id)} />
              ))}
            </div>
          </details>
        ) : null}
      </fieldset>
      {op && /press/i.test(op.name) ? <Caution title={t('floor.pressingTitle')} items={[t('floor.pressing1'), t('floor.pressing2')]} source={t('floor.pressingSource')} /> : null}
      {op?.isCheck ? (
        <div className="space-y-2 rounded-lg border border-calico-200 bg-white p-3">
          <p className="field-label">{t('floor.checkSpec', { size: bundle.size })}</p>
          {bundle.specNotes.length ? (
            <ul className="list-disc pl-5 text-sm">{bundle.specNotes.map((s) => <li key={s}>{s}</li>)}</ul>
          ) : (
            <p className="text-sm text-ink-600">{t('floor.noSpec')}</p>
          )}
          <div className="flex gap-2" role="radiogroup" aria-label={t('floor.checkResult')}>
            {(['pass', 'fail'] as const).map((o) => (
              <label key={o} className={`flex-1 rounded-lg border px-3 py-2 text-center font-medium ${outcome === o ? (o === 'pass' ? 'border-thread-700 bg-thread-700/10' : 'border-madder-500 bg-madder-100') : 'border-calico-200'}`}>
                <input type="radio" className="sr-only" name="outcome" checked={outcome === o} onChange={() => setOutcome(o)} />
                {o === 'pass' ? t('floor.pass') : t('floor.fail')}
              </label>
            ))}
          </div>
          {outcome === 'fail' ? (
            <>
              <label className="field-label" htmlFor="defect">{t('floor.defect')}</label>
              <input id="defect" className="field-input" value={defect} maxLength={200} onChange={(e) => setDefect(e.target.value)} placeholder={t('floor.defectExample')} />
              <label className="field-label" htmlFor="rework">{t('floor.sendBackTo')}</label>
              <select id="rework" className="field-input" value={rework ?? ''} onChange={(e) => setRework(Number(e.target.value) || undefined)}>
                <option value="">{t('floor.pickRedo')}</option>
                {bundle.operations.filter((o) => !o.isCheck).map((o) => <option key={o.id} value={o.id}>{o.code} {o.name}</option>)}
              </select>
            </>
          ) : null}
        </div>
      ) : null}
      <button type="button" className="btn-primary w-full py-3 text-base" disabled={!canLog || busy} onClick={handleLog}>
        {busy ? t('floor.logging') : !op ? t('floor.pickOperation') : op.isCheck && outcome === 'fail' ? t('floor.logFail') : t('floor.logDone')}
      </button>
    </div>
  );
}
