import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { PayRulesDto } from '@shared/schemas/pay';
import { parseMajor, toMajorText } from '@shared/units/money';
import { Card, ErrorNote, Spinner } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { fmt } from '@/lib/format';
import { localSentence, useTranslation } from '@/lib/i18n';
import { payQueries, useSavePayRules } from '../api/pay-queries';
import { area } from '../words';

/**
 * The owner's pay rules: a minimum-wage top-up per pay period for the hours attended, and a premium on hours beyond
 * the working calendar's. Approved periods keep the rules they were approved with.
 */
export function PayRulesCard() {
  const { t } = useTranslation();
  const rules = useQuery(payQueries.rules());
  if (!rules.data) return <Card title={t(`${area}.rules.title`)}><Spinner /></Card>;
  return <PayRulesForm key={JSON.stringify(rules.data)} rules={rules.data} />;
}

function PayRulesForm({ rules }: { rules: PayRulesDto }) {
  const { t } = useTranslation();
  const [on, setOn] = useState(rules.minimumWageOn);
  const [hourly, setHourly] = useState(rules.minimumHourlyMinor == null ? '' : toMajorText(rules.minimumHourlyMinor, rules.currency));
  const [premium, setPremium] = useState(String(rules.overtimePremiumPercent));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useSavePayRules();

  const handleSave = async () => {
    const minor = hourly.trim() === '' ? null : parseMajor(hourly, rules.currency);
    if (hourly.trim() !== '' && minor === null) return setErrors({ minimumHourlyMinor: t(`${area}.rules.amountNeeded`, { example: toMajorText(15000, rules.currency) }) });
    setErrors({});
    try {
      await save.mutateAsync({ minimumWageOn: on, minimumHourlyMinor: minor, overtimePremiumPercent: Number(premium) });
    } catch (e) {
      if (e instanceof ApiError) setErrors(e.fields);
    }
  };

  return (
    <Card title={t(`${area}.rules.title`)}>
      <p role="note" className="mb-3 rounded-lg bg-saffron-100 px-3 py-2 text-sm text-ink-800">{localSentence(rules.caution, fmt().settings)}</p>
      <div className="flex flex-wrap items-end gap-4">
        <label className="flex items-center gap-2 text-sm">
          <input type="checkbox" checked={on} onChange={(e) => setOn(e.target.checked)} />
          {t(`${area}.rules.topUp`)}
        </label>
        <label className="text-sm">
          {t(`${area}.rules.minimumWage`, { currency: rules.currency })}
          <input aria-label={t(`${area}.rules.minimumWageLabel`)} className="field-input w-32" value={hourly} onChange={(e) => setHourly(e.target.value)} aria-invalid={Boolean(errors.minimumHourlyMinor)} />
          {errors.minimumHourlyMinor ? <span className="field-error block">{errors.minimumHourlyMinor}</span> : null}
        </label>
        <label className="text-sm">
          {t(`${area}.rules.premium`)}
          <input aria-label={t(`${area}.rules.premium`)} className="field-input w-24" value={premium} onChange={(e) => setPremium(e.target.value)} aria-invalid={Boolean(errors.overtimePremiumPercent)} />
          {errors.overtimePremiumPercent ? <span className="field-error block">{errors.overtimePremiumPercent}</span> : null}
        </label>
        <button type="button" className="btn-primary" disabled={save.isPending} onClick={handleSave}>{save.isPending ? t(`${area}.rules.saving`) : t(`${area}.rules.save`)}</button>
      </div>
      <p className="mt-2 text-xs text-ink-600">{t(`${area}.rules.explain`)}</p>
      <ErrorNote error={save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? save.error : null} />
    </Card>
  );
}
