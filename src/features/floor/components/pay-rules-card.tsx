import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { PayRulesDto } from '@shared/schemas/pay';
import { parseMajor, toMajorText } from '@shared/units/money';
import { Card, ErrorNote, Spinner } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { payQueries, useSavePayRules } from '../api/pay-queries';

/**
 * The owner's pay rules: a minimum-wage top-up per pay period for the hours attended, and a premium on hours beyond
 * the working calendar's. Approved periods keep the rules they were approved with.
 */
export function PayRulesCard() {
  const rules = useQuery(payQueries.rules());
  if (!rules.data) return <Card title="Pay rules"><Spinner /></Card>;
  return <PayRulesForm key={JSON.stringify(rules.data)} rules={rules.data} />;
}

function PayRulesForm({ rules }: { rules: PayRulesDto }) {
  const [on, setOn] = useState(rules.minimumWageOn);
  const [hourly, setHourly] = useState(rules.minimumHourlyMinor == null ? '' : toMajorText(rules.minimumHourlyMinor, rules.currency));
  const [premium, setPremium] = useState(String(rules.overtimePremiumPercent));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useSavePayRules();

  const handleSave = async () => {
    const minor = hourly.trim() === '' ? null : parseMajor(hourly, rules.currency);
    if (hourly.trim() !== '' && minor === null) return setErrors({ minimumHourlyMinor: 'Give an amount, e.g. 150.00' });
    setErrors({});
    try {
      await save.mutateAsync({ minimumWageOn: on, minimumHourlyMinor: minor, overtimePremiumPercent: Number(premium) });
    } catch (e) {
      if (e instanceof ApiError) setErrors(e.fields);
    }
  };

  return (
    <Card title="Pay rules">
      <p role="note" className="mb-3 rounded-lg bg-saffron-100 px-3 py-2 text-sm text-ink-800">{rules.caution}</p>
      <div className="flex flex-wrap items-end gap-4">
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={on} onChange={(e) => setOn(e.target.checked)} />
          Top up to the minimum wage for the hours attended in each pay period
        </label>
        <label className="text-sm">
          Minimum wage per hour ({rules.currency})
          <input aria-label="Minimum wage per hour" className="field-input w-32" value={hourly} onChange={(e) => setHourly(e.target.value)} aria-invalid={Boolean(errors.minimumHourlyMinor)} />
          {errors.minimumHourlyMinor ? <span className="field-error block">{errors.minimumHourlyMinor}</span> : null}
        </label>
        <label className="text-sm">
          Overtime premium %
          <input aria-label="Overtime premium %" className="field-input w-24" value={premium} onChange={(e) => setPremium(e.target.value)} aria-invalid={Boolean(errors.overtimePremiumPercent)} />
          {errors.overtimePremiumPercent ? <span className="field-error block">{errors.overtimePremiumPercent}</span> : null}
        </label>
        <button type="button" className="btn-primary" disabled={save.isPending} onClick={handleSave}>{save.isPending ? 'Saving…' : 'Save pay rules'}</button>
      </div>
      <p className="mt-2 text-xs text-ink-600">
        Overtime is time attended beyond the working calendar's hours on a working day, and all time on a day off or holiday. The premium is a
        percentage of the person's regular hourly rate (piece pay ÷ hours attended, or the minimum wage when higher); pieces made in overtime
        are already paid at their rate. Each pay line is rounded once to the nearest minor unit, halves up.
      </p>
      <ErrorNote error={save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? save.error : null} />
    </Card>
  );
}
