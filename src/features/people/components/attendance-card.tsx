import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { AttendanceDayDto } from '@shared/schemas/floor';
import { Card, ErrorNote, Spinner } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { formatDate } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { attendanceQueries, useSaveAttendance } from '../api/people-queries';
import { area } from '../words';

/** Hours as typed back into the box: a plain number a person can edit (the input reads `,` or `.`). */
const hoursText = (minutes: number | null) => (minutes == null ? '' : String(Math.round((minutes / 60) * 100) / 100));

/**
 * Who is in on a day and for how long, in hours. It feeds the line plan's people present (today) and the hours
 * the minimum-wage top-up counts. Days of an approved pay period are frozen.
 */
export function AttendanceCard() {
  const { t } = useTranslation();
  const [day, setDay] = useState<string | null>(null);
  const q = useQuery(attendanceQueries.day(day));
  return (
    <Card title={t(`${area}.attendance.title`)} className="mb-5">
      <label className="mb-3 block max-w-xs text-sm">
        {t(`${area}.attendance.day`)}
        <input type="date" aria-label={t(`${area}.attendance.dayLabel`)} className="field-input" value={day ?? q.data?.day ?? ''} onChange={(e) => setDay(e.target.value || null)} />
      </label>
      {q.data ? <AttendanceForm key={`${q.data.day}-${q.dataUpdatedAt}`} data={q.data} /> : <Spinner />}
      <ErrorNote error={q.error} />
    </Card>
  );
}

function AttendanceForm({ data }: { data: AttendanceDayDto }) {
  const { t } = useTranslation();
  const [hours, setHours] = useState<Record<number, string>>(() => Object.fromEntries(data.people.map((p) => [p.userId, hoursText(p.minutes)])));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);
  const save = useSaveAttendance();
  const frozen = data.frozenByPeriodId != null;

  const handleSave = async () => {
    const found: Record<string, string> = {};
    const entries = data.people.flatMap((p) => {
      const text = (hours[p.userId] ?? '').trim();
      if (text === '') return [];
      const h = Number(text.replace(',', '.'));
      if (!Number.isFinite(h) || h < 0 || h > 24) {
        found[p.userId] = t(`${area}.attendance.hoursRange`);
        return [];
      }
      return [{ userId: p.userId, minutes: Math.round(h * 60) }];
    });
    setErrors(found);
    setSaved(false);
    if (Object.keys(found).length || entries.length === 0) return;
    try {
      await save.mutateAsync({ day: data.day, entries });
      setSaved(true);
    } catch (e) {
      if (e instanceof ApiError && Object.keys(e.fields).length) setErrors(e.fields);
    }
  };

  return (
    <>
      {frozen ? <p role="note" className="mb-2 text-sm text-saffron-700">{t(`${area}.attendance.frozen`)}</p> : null}
      <p className="mb-2 text-sm text-ink-600">{t(`${area}.attendance.present`, { count: data.present, day: formatDate(data.day) })}</p>
      <table className="text-sm" aria-label={t(`${area}.attendance.on`, { day: formatDate(data.day) })}>
        <thead>
          <tr className="text-left text-ink-600">
            <th className="pr-4">{t(`${area}.attendance.person`)}</th>
            <th className="pr-4">{t(`${area}.attendance.role`)}</th>
            <th>{t(`${area}.attendance.hours`)}</th>
          </tr>
        </thead>
        <tbody>
          {data.people.map((p) => (
            <tr key={p.userId}>
              <td className="pr-4">{p.name}</td>
              <td className="pr-4">{t(`roles.${p.role}`, { defaultValue: p.role })}</td>
              <td>
                <input aria-label={t(`${area}.attendance.hoursOf`, { name: p.name })} className="field-input w-20" disabled={frozen} value={hours[p.userId] ?? ''} onChange={(e) => setHours((h) => ({ ...h, [p.userId]: e.target.value }))} />
                {errors[p.userId] ? <span className="field-error block">{errors[p.userId]}</span> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <ErrorNote error={save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? save.error : null} />
      <div className="mt-2 flex items-center gap-3">
        <button type="button" className="btn-primary" disabled={frozen || save.isPending} onClick={handleSave}>{save.isPending ? t(`${area}.attendance.saving`) : t(`${area}.attendance.save`)}</button>
        {saved ? <span role="status" className="text-sm text-thread-700">{t(`${area}.attendance.saved`)}</span> : null}
      </div>
    </>
  );
}
