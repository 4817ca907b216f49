import { useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { format, subDays } from 'date-fns';
import { useState } from 'react';
import { EFFICIENCY_DEFINITION } from '@planning';
import type { PayoutDto, PayPeriodDto } from '@shared/schemas/pay';
import { ConfirmButton } from '@/components/ui/confirm-button';
import { Badge, Card, ErrorNote, PageHeader, Spinner } from '@/components/ui/page';
import { downloadFile } from '@/lib/api-client';
import { formatEfficiency, formatMoney } from '@/lib/format';
import { payQueries, useApprovePayPeriod, usePayPerson } from '../api/pay-queries';

const statusTone = { paid: 'teal', pending: 'gold', failed: 'red', to_check: 'red' } as const;
const statusLabel = { paid: 'paid', pending: 'sending', failed: 'refused', to_check: 'to check' } as const;

/** The button's words and question for a payout in each state. */
function payAction(status: PayoutDto['status'] | undefined, name: string, amount: string) {
  if (status === 'to_check') {
    return { label: 'Check payment', question: `Ask the payments service whether ${name} was paid ${amount}, and send the same payment only if not?`, confirm: 'Yes, check' };
  }
  const label = status === 'failed' || status === 'pending' ? 'Retry payment' : 'Pay';
  return { label, question: `Pay ${name} ${amount} now? Money leaves the studio’s account.`, confirm: 'Yes, pay' };
}

function PayoutRow({ period, line, payout }: { period: PayPeriodDto; line: PayPeriodDto['lines'][number]; payout?: PayoutDto }) {
  const pay = usePayPerson();
  const status = payout?.status;
  const action = payAction(status, line.name, formatMoney(line.amountMinor, period.currency));
  return (
    <li className="flex flex-wrap items-center justify-between gap-2 py-2" aria-label={`Payout ${line.name}`}>
      <span className="min-w-40 font-medium">{line.name}</span>
      <span className="text-sm text-ink-600">{line.pieces} pcs</span>
      <span className="font-medium">{formatMoney(line.amountMinor, period.currency)}</span>
      {status ? <Badge tone={statusTone[status]}>{statusLabel[status]}</Badge> : <Badge>not paid</Badge>}
      {status !== 'paid' && line.amountMinor > 0 ? (
        pay.isPending ? (
          <span className="text-sm text-ink-600">Paying…</span>
        ) : (
          <ConfirmButton
            label={action.label}
            question={action.question}
            confirmLabel={action.confirm}
            onConfirm={() => pay.mutate({ periodId: period.id, userId: line.userId })}
          />
        )
      ) : null}
      {payout?.error ? <p className="w-full text-sm text-madder-700">Why: {payout.error}</p> : null}
      {payout?.providerRef ? <p className="w-full text-xs text-ink-600">Reference {payout.providerRef}</p> : null}
      <ErrorNote error={pay.error} />
    </li>
  );
}

function PeriodCard({ period }: { period: PayPeriodDto }) {
  const [error, setError] = useState<unknown>(null);
  return (
    <Card title={<span>Pay period {period.fromDay} to {period.toDay} <Badge tone={period.status === 'paid' ? 'teal' : 'blue'}>{period.status}</Badge></span>}>
      <p className="text-sm text-ink-600">Approved by {period.approvedBy} · total {formatMoney(period.totalMinor, period.currency)}</p>
      <ul className="divide-y divide-calico-200">
        {period.lines.map((l) => <PayoutRow key={l.userId} period={period} line={l} payout={period.payouts.find((p) => p.userId === l.userId)} />)}
      </ul>
      <button type="button" className="btn-quiet mt-2" onClick={() => downloadFile(`/pay/periods/${period.id}/sheet.xlsx`, `pay-${period.fromDay}-to-${period.toDay}.xlsx`).catch(setError)}>
        Download pay sheet (XLSX)
      </button>
      <ErrorNote error={error} />
    </Card>
  );
}

export function PayPage() {
  const today = new Date();
  const [from, setFrom] = useState(format(subDays(today, 7), 'yyyy-MM-dd'));
  const [to, setTo] = useState(format(today, 'yyyy-MM-dd'));
  const { data: mode } = useSuspenseQuery(payQueries.mode());
  const { data: periods } = useSuspenseQuery(payQueries.periods());
  const preview = useQuery(payQueries.preview(from, to));
  const approve = useApprovePayPeriod();
  return (
    <>
      <PageHeader title="Piece-rate pay" subtitle={`Pieces × rate per person; rework is not paid twice. Approve a period, then pay each person. Efficiency: ${EFFICIENCY_DEFINITION.toLowerCase()}.`} />
      {mode.testMode ? <p role="note" className="mb-4 rounded-lg bg-indigo-100 px-3 py-2 text-sm font-medium text-indigo-700">{mode.message}</p> : null}
      <div className="space-y-5">
        <Card title="Pay period">
          <div className="flex flex-wrap items-end gap-3">
            <label className="text-sm">From<input type="date" className="field-input" aria-label="From" value={from} onChange={(e) => setFrom(e.target.value)} /></label>
            <label className="text-sm">To<input type="date" className="field-input" aria-label="To" value={to} onChange={(e) => setTo(e.target.value)} /></label>
            <ConfirmButton
              label="Approve pay period"
              question={`Approve ${preview.data?.people.length ?? 0} people, ${preview.data ? formatMoney(preview.data.totalMinor, preview.data.currency) : ''}, for ${from} to ${to}? These days close: work logged on them later is paid in the next period.`}
              confirmLabel="Yes, approve"
              disabled={approve.isPending || !preview.data?.people.length || Boolean(preview.data?.overlapsPeriodId)}
              onConfirm={() => approve.mutate({ fromDay: from, toDay: to })}
            />
          </div>
          <ErrorNote error={approve.error ?? preview.error} />
          {preview.data?.overlapsPeriodId ? <p className="mt-2 text-sm text-saffron-700">These days overlap pay period {preview.data.overlapsPeriodId}, already approved.</p> : null}
          {preview.data?.carriedLogs ? (
            <p className="mt-2 text-sm text-ink-600">
              Includes {preview.data.carriedLogs} {preview.data.carriedLogs === 1 ? 'log' : 'logs'} made on already-approved days after their approval.
            </p>
          ) : null}
          {preview.data ? (
            <div role="region" aria-label="Pay lines" tabIndex={0} className="mt-3 overflow-x-auto">
              <table className="min-w-full text-sm" aria-label="Pay preview">
                <thead className="bg-thread-700 text-left text-calico-50">
                  <tr><th className="px-3 py-2">Person</th><th className="px-3 py-2">Pieces</th><th className="px-3 py-2" title={EFFICIENCY_DEFINITION}>Efficiency</th><th className="px-3 py-2">Amount</th></tr>
                </thead>
                <tbody>
                  {preview.data.people.map((p) => (
                    <tr key={p.userId} className="border-t border-calico-200">
                      <td className="px-3 py-2">{p.name}</td>
                      <td className="px-3 py-2">{p.pieces}</td>
                      <td className="px-3 py-2">{formatEfficiency(p.efficiencyPercent)}</td>
                      <td className="px-3 py-2">{formatMoney(p.amountMinor, preview.data.currency)}</td>
                    </tr>
                  ))}
                  <tr className="border-t border-calico-200 font-semibold"><td className="px-3 py-2" colSpan={3}>Total</td><td className="px-3 py-2">{formatMoney(preview.data.totalMinor, preview.data.currency)}</td></tr>
                </tbody>
              </table>
            </div>
          ) : <Spinner />}
        </Card>
        {periods.map((p) => <PeriodCard key={p.id} period={p} />)}
      </div>
    </>
  );
}
