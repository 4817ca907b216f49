import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { format, subDays } from 'date-fns';
import { useState } from 'react';
import type { TFunction } from 'i18next';
import type { PayoutDto, PayPeriodDto } from '@shared/schemas/pay';
import { ConfirmButton } from '@/components/ui/confirm-button';
import { Badge, Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { downloadFile } from '@/lib/api-client';
import { fmt, formatDate, formatEfficiency, formatMoney, useFormat } from '@/lib/format';
import { localSentence, useTranslation } from '@/lib/i18n';
import { area } from '../words';
import { PayRulesCard } from './pay-rules-card';
import { payQueries, useApprovePayPeriod, usePayPerson } from '../api/pay-queries';

const statusTone = { paid: 'teal', pending: 'gold', failed: 'red', to_check: 'red' } as const;

/** The button's words and question for a payout in each state. */
function payAction(t: TFunction, status: PayoutDto['status'] | undefined, name: string, amount: string) {
  if (status === 'to_check') {
    return { label: t(`${area}.pay.checkPayment`), question: t(`${area}.pay.checkQuestion`, { name, amount }), confirm: t(`${area}.pay.checkYes`) };
  }
  const label = status === 'failed' || status === 'pending' ? t(`${area}.pay.retry`) : t(`${area}.pay.pay`);
  return { label, question: t(`${area}.pay.payQuestion`, { name, amount }), confirm: t(`${area}.pay.payYes`) };
}

function PayoutRow({ period, line, payout }: { period: PayPeriodDto; line: PayPeriodDto['lines'][number]; payout?: PayoutDto }) {
  const { t } = useTranslation();
  const pay = usePayPerson();
  const status = payout?.status;
  const action = payAction(t, status, line.name, formatMoney(line.amountMinor, period.currency));
  return (
    <li className="flex flex-wrap items-center justify-between gap-2 py-2" aria-label={t(`${area}.pay.payout`, { name: line.name })}>
      <span className="min-w-40 font-medium">{line.name}</span>
      <span className="text-sm text-ink-600">{t(`${area}.pcs`, { count: line.pieces })}</span>
      <span className="font-medium">{formatMoney(line.amountMinor, period.currency)}</span>
      {status ? <Badge tone={statusTone[status]}>{t(`${area}.pay.status.${status}`)}</Badge> : <Badge>{t(`${area}.pay.notPaid`)}</Badge>}
      {status !== 'paid' && line.amountMinor > 0 ? (
        pay.isPending ? (
          <span className="text-sm text-ink-600">{t(`${area}.pay.paying`)}</span>
        ) : (
          <ConfirmButton
            label={action.label}
            question={action.question}
            confirmLabel={action.confirm}
            onConfirm={() => pay.mutate({ periodId: period.id, userId: line.userId })}
          />
        )
      ) : null}
      {payout?.error ? <p className="w-full text-sm text-madder-700">{t(`${area}.pay.why`, { error: payout.error })}</p> : null}
      {payout?.providerRef ? <p className="w-full text-xs text-ink-600">{t(`${area}.pay.reference`, { ref: payout.providerRef })}</p> : null}
      <ErrorNote error={pay.error} />
    </li>
  );
}

function PeriodCard({ period }: { period: PayPeriodDto }) {
  const { t } = useTranslation();
  const [error, setError] = useState<unknown>(null);
  const title = t(`${area}.pay.periodTitle`, { number: period.number, from: formatDate(period.fromDay), to: formatDate(period.toDay) });
  return (
    <Card title={<span>{title} <Badge tone={period.status === 'paid' ? 'teal' : 'blue'}>{t(`${area}.pay.periodStatus.${period.status}`)}</Badge></span>}>
      <p className="text-sm text-ink-600">{t(`${area}.pay.approvedBy`, { name: period.approvedBy, total: formatMoney(period.totalMinor, period.currency) })}</p>
      <ul className="divide-y divide-calico-200">
        {period.lines.map((l) => <PayoutRow key={l.userId} period={period} line={l} payout={period.payouts.find((p) => p.userId === l.userId)} />)}
      </ul>
      <button type="button" className="btn-quiet mt-2" onClick={() => downloadFile(`/pay/periods/${period.id}/sheet.xlsx`, `pay-${period.fromDay}-to-${period.toDay}.xlsx`).catch(setError)}>
        {t(`${area}.pay.sheet`)}
      </button>
      <ErrorNote error={error} />
    </Card>
  );
}

export function PayPage() {
  const { t } = useTranslation();
  const f = useFormat();
  const today = new Date();
  const [from, setFrom] = useState(format(subDays(today, 7), 'yyyy-MM-dd'));
  const [to, setTo] = useState(format(today, 'yyyy-MM-dd'));
  const { data: mode } = useSuspenseQuery(payQueries.mode());
  const { data: periods } = useSuspenseQuery(payQueries.periods());
  const preview = useQuery(payQueries.preview(from, to));
  const approve = useApprovePayPeriod();
  return (
    <>
      <PageHeader title={t(`${area}.pay.title`)} subtitle={t(`${area}.pay.subtitle`, { efficiency: t(`${area}.efficiencyLower`) })} />
      {mode.testMode ? <p role="note" className="mb-4 rounded-lg bg-indigo-100 px-3 py-2 text-sm font-medium text-indigo-700">{localSentence(mode.message, fmt().settings)}</p> : null}
      <div className="space-y-5">
        <Card title={t(`${area}.pay.period`)}>
          <div className="flex flex-wrap items-end gap-3">
            <label className="text-sm">{t(`${area}.pay.from`)}<input type="date" className="field-input" aria-label={t(`${area}.pay.from`)} value={from} onChange={(e) => setFrom(e.target.value)} /></label>
            <label className="text-sm">{t(`${area}.pay.to`)}<input type="date" className="field-input" aria-label={t(`${area}.pay.to`)} value={to} onChange={(e) => setTo(e.target.value)} /></label>
            <ConfirmButton
              label={t(`${area}.pay.approve`)}
              question={t(`${area}.pay.approveQuestion`, {
                count: preview.data?.people.length ?? 0,
                total: preview.data ? formatMoney(preview.data.totalMinor, preview.data.currency) : '',
                from: formatDate(from),
                to: formatDate(to),
              })}
              confirmLabel={t(`${area}.pay.approveYes`)}
              disabled={approve.isPending || !preview.data?.people.length || Boolean(preview.data?.overlapsPeriodId)}
              onConfirm={() => approve.mutate({ fromDay: from, toDay: to })}
            />
          </div>
          <ErrorNote error={approve.error ?? preview.error} />
          {preview.data?.overlapsPeriodId ? <p className="mt-2 text-sm text-saffron-700">{t(`${area}.pay.overlaps`, { number: preview.data.overlapsPeriodNumber })}</p> : null}
          {preview.data?.carriedLogs ? (
            <p className="mt-2 text-sm text-ink-600">{t(`${area}.pay.carried`, { count: preview.data.carriedLogs })}</p>
          ) : null}
          {preview.data ? (
            <div role="region" aria-label={t(`${area}.pay.lines`)} tabIndex={0} className="mt-3 overflow-x-auto">
              <table className="min-w-full text-sm" aria-label={t(`${area}.pay.preview`)}>
                <thead className="bg-thread-700 text-left text-calico-50">
                  <tr>
                    <th className="px-3 py-2">{t(`${area}.pay.cols.person`)}</th>
                    <th className="px-3 py-2">{t(`${area}.pay.cols.pieces`)}</th>
                    <th className="px-3 py-2" title={t(`${area}.efficiency`)}>{t(`${area}.pay.cols.efficiency`)}</th>
                    <th className="px-3 py-2">{t(`${area}.pay.cols.piecePay`)}</th>
                    <th className="px-3 py-2">{t(`${area}.pay.cols.overtime`)}</th>
                    <th className="px-3 py-2">{t(`${area}.pay.cols.topUp`)}</th>
                    <th className="px-3 py-2">{t(`${area}.pay.cols.amount`)}</th>
                  </tr>
                </thead>
                <tbody>
                  {preview.data.people.map((p) => (
                    <tr key={p.userId} className="border-t border-calico-200">
                      <td className="px-3 py-2">{p.name}</td>
                      <td className="px-3 py-2">{f.number(p.pieces)}</td>
                      <td className="px-3 py-2">{formatEfficiency(p.efficiencyPercent)}</td>
                      <td className="px-3 py-2">{formatMoney(p.pieceMinor, preview.data.currency)}</td>
                      <td className="px-3 py-2">{p.overtimeMinor ? `${formatMoney(p.overtimeMinor, preview.data.currency)} (${t(`${area}.pay.hours`, { value: f.number(p.overtimeMinutes / 60, 1) })})` : '—'}</td>
                      <td className="px-3 py-2">{p.topUpMinor ? formatMoney(p.topUpMinor, preview.data.currency) : '—'}</td>
                      <td className="px-3 py-2">{formatMoney(p.amountMinor, preview.data.currency)}</td>
                    </tr>
                  ))}
                  <tr className="border-t border-calico-200 font-semibold"><td className="px-3 py-2" colSpan={6}>{t(`${area}.pay.total`)}</td><td className="px-3 py-2">{formatMoney(preview.data.totalMinor, preview.data.currency)}</td></tr>
                </tbody>
              </table>
            </div>
          ) : preview.isError ? null : <Spinner />}
        </Card>
        <PayRulesCard />
        {periods.map((p) => <PeriodCard key={p.id} period={p} />)}
      </div>
    </>
  );
}
