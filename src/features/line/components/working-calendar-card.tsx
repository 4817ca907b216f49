import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { workingCalendarInput, type WorkingCalendarDto } from '@shared/schemas/line';
import { Caution, Card, ErrorNote, Spinner } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { calendarQueries, useSaveCalendar } from '../api/line-queries';

const DAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'];

/** The studio's working calendar: time zone, working days (Saturday work), shift, break, holidays, overtime limit. */
export function WorkingCalendarCard() {
  const q = useQuery(calendarQueries.detail());
  if (!q.data) return <Card title="Working calendar">{q.error ? <ErrorNote error={q.error} /> : <Spinner />}</Card>;
  return <CalendarForm key={JSON.stringify(q.data)} cal={q.data} />;
}

function CalendarForm({ cal }: { cal: WorkingCalendarDto }) {
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
      for (const i of parsed.error.issues) found[String(i.path[0] ?? 'form')] ??= i.message;
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
    <Card title="Working calendar">
      <p className="mb-3 text-sm text-ink-600">
        {cal.entered ? 'The schedule and pay use this calendar.' : 'Not entered yet: the schedule takes Monday to Friday and the studio’s working day, in UTC.'} Today here is {cal.today}; {cal.hoursPerWeek} h a week.
      </p>
      <div className="grid gap-3 sm:grid-cols-2">
        <label className="text-sm">Time zone (e.g. Africa/Nairobi)<input aria-label="Time zone" className="field-input" value={timeZone} onChange={(e) => setTimeZone(e.target.value)} />{err('timeZone')}</label>
        <fieldset className="text-sm">
          <legend>Working days</legend>
          <div className="flex flex-wrap gap-2">
            {DAYS.map((d, i) => (
              <label key={d} className="flex items-center gap-1">
                <input type="checkbox" checked={workdays.includes(i)} onChange={(e) => setWorkdays((w) => (e.target.checked ? [...w, i].sort() : w.filter((x) => x !== i)))} />
                {d}
              </label>
            ))}
          </div>
          {err('workdays')}
        </fieldset>
        <label className="text-sm">Shift starts<input aria-label="Shift starts" className="field-input" value={shiftStart} onChange={(e) => setShiftStart(e.target.value)} />{err('shiftStart')}</label>
        <label className="text-sm">Shift ends<input aria-label="Shift ends" className="field-input" value={shiftEnd} onChange={(e) => setShiftEnd(e.target.value)} />{err('shiftEnd')}</label>
        <label className="text-sm">Unpaid break (minutes)<input aria-label="Unpaid break (minutes)" className="field-input" value={breakMinutes} onChange={(e) => setBreakMinutes(e.target.value)} />{err('breakMinutes')}</label>
        <label className="text-sm">Overtime limit (hours a week, blank for none)<input aria-label="Overtime limit (hours a week)" className="field-input" value={limit} onChange={(e) => setLimit(e.target.value)} />{err('overtimeLimitHoursPerWeek')}</label>
        <label className="text-sm sm:col-span-2">Holidays (dates, e.g. 2026-12-25 2026-12-26)<input aria-label="Holidays" className="field-input" value={holidays} onChange={(e) => setHolidays(e.target.value)} />{err('holidays')}</label>
      </div>
      <ErrorNote error={save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? save.error : null} />
      <button type="button" className="btn-primary mt-3" disabled={save.isPending} onClick={handleSave}>{save.isPending ? 'Saving…' : 'Save calendar'}</button>
      <div className="mt-3">
        <Caution title={cal.exceedsIlo ? 'These hours are above the ILO figures' : 'Working hours'} items={[cal.caution]} source="ILO Hours of Work (Industry) Convention, 1919 (No. 1)." />
      </div>
    </Card>
  );
}
