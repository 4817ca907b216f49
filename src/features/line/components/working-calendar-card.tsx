import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { workingCalendarInput, type WorkingCalendarDto } from '@shared/schemas/line';
import { Caution, Card, ErrorNote, Spinner } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { fmt, formatDate } from '@/lib/format';
import { localSentence, useTranslation } from '@/lib/i18n';
import { calendarQueries, useSaveCalendar } from '../api/line-queries';
import { area } from '../words';
import { workingHoursCaution } from '../hooks/working-hours-caution';

/** Days of the week as the calendar stores them: 0 is Sunday. */
const DAYS = [0, 1, 2, 3, 4, 5, 6] as const;

/** The studio's working calendar: time zone, working days (Saturday work), shift, break, holidays, overtime limit. */
export function WorkingCalendarCard() {
  const { t } = useTranslation();
  const q = useQuery(calendarQueries.detail());
  if (!q.data) return <Card title={t(`${area}.calendar.title`)}>{q.error ? <ErrorNote error={q.error} /> : <Spinner />}</Card>;
  return <CalendarForm key={JSON.stringify(q.data)} cal={q.data} />;
}

function CalendarForm({ cal }: { cal: WorkingCalendarDto }) {
  const { t } = useTranslation();
  const w = (key: string, values?: Record<string, unknown>) => t(`${area}.calendar.${key}`, values);
  const [timeZone, setTimeZone] = useState(cal.timeZone);
  const [workdays, setWorkdays] = useState<number[]>(cal.workdays);
  const [shiftStart, setShiftStart] = useState(cal.shiftStart);
  const [shiftEnd, setShiftEnd] = useState(cal.shiftEnd);
  const [breakMinutes, setBreakMinutes] = useState(String(cal.breakMinutes));
  const [holidays, setHolidays] = useState(cal.holidays.join(' '));
  const [limit, setLimit] = useState(cal.overtimeLimitHoursPerWeek == null ? '' : String(cal.overtimeLimitHoursPerWeek));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const save = useSaveCalendar();

  const handleSave = async () => {
    const parsed = workingCalendarInput.safeParse({
      timeZone,
      workdays,
      shiftStart,
      shiftEnd,
      breakMinutes: Number(breakMinutes),
      holidays: holidays.split(/[\s,]+/).filter(Boolean),
      overtimeLimitHoursPerWeek: limit.trim() === '' ? null : Number(limit),
    });
    if (!parsed.success) {
      const found: Record<string, string> = {};
      for (const i of parsed.error.issues) found[String(i.path[0] ?? 'form')] ??= localSentence(i.message, fmt().settings);
      return setErrors(found);
    }
    setErrors({});
    try {
      await save.mutateAsync(parsed.data);
    } catch (e) {
      if (e instanceof ApiError) setErrors(Object.fromEntries(Object.entries(e.fields).map(([k, v]) => [k.split('.')[0], v])));
    }
  };
  const err = (k: string) => (errors[k] ? <span className="field-error block">{errors[k]}</span> : null);

  return (
    <Card title={w('title')}>
      <p className="mb-3 text-sm text-ink-600">
        {cal.entered ? w('entered') : w('notEntered')}
        {w('today', { today: formatDate(cal.today), hours: cal.hoursPerWeek })}
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="text-sm">{w('timeZone')}<input aria-label={w('timeZoneLabel')} className="field-input" value={timeZone} onChange={(e) => setTimeZone(e.target.value)} />{err('timeZone')}</label>
        <fieldset className="text-sm">
          <legend>{w('workingDays')}</legend>
          <div className="flex flex-wrap gap-2">
            {DAYS.map((d, i) => (
              <label key={d} className="flex items-center gap-1">
                <input type="checkbox" checked={workdays.includes(i)} onChange={(e) => setWorkdays((w) => (e.target.checked ? [...w, i].sort() : w.filter((x) => x !== i)))} />
                {w(`days.${d}`)}
              </label>
            ))}
          </div>
          {err('workdays')}
        </fieldset>
        <label className="text-sm">{w('shiftStarts')}<input aria-label={w('shiftStarts')} className="field-input" value={shiftStart} onChange={(e) => setShiftStart(e.target.value)} />{err('shiftStart')}</label>
        <label className="text-sm">{w('shiftEnds')}<input aria-label={w('shiftEnds')} className="field-input" value={shiftEnd} onChange={(e) => setShiftEnd(e.target.value)} />{err('shiftEnd')}</label>
        <label className="text-sm">{w('breakMinutes')}<input aria-label={w('breakMinutes')} className="field-input" value={breakMinutes} onChange={(e) => setBreakMinutes(e.target.value)} />{err('breakMinutes')}</label>
        <label className="text-sm">{w('overtimeLimit')}<input aria-label={w('overtimeLimitLabel')} className="field-input" value={limit} onChange={(e) => setLimit(e.target.value)} />{err('overtimeLimitHoursPerWeek')}</label>
        <label className="text-sm sm:col-span-2">{w('holidays')}<input aria-label={w('holidaysLabel')} className="field-input" value={holidays} onChange={(e) => setHolidays(e.target.value)} />{err('holidays')}</label>
      </div>
      <ErrorNote error={save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? save.error : null} />
      <button type="button" className="btn-primary mt-3" disabled={save.isPending} onClick={handleSave}>{save.isPending ? w('saving') : w('save')}</button>
      <div className="mt-3">
        <Caution title={cal.exceedsIlo ? w('aboveIlo') : w('hours')} items={[workingHoursCaution(cal.caution)]} source={w('iloSource')} />
      </div>
    </Card>
  );
}
