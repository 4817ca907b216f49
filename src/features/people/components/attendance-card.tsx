import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { AttendanceDayDto } from '@shared/schemas/floor';
import { Card, ErrorNote, Spinner } from '@/components/ui/page';
import { ApiError } from '@/lib/api-client';
import { attendanceQueries, useSaveAttendance } from '../api/people-queries';

const hoursText = (minutes: number | null) => (minutes == null ? '' : String(Math.round((minutes / 60) * 100) / 100));

/**
 * Who is in on a day and for how long, in hours. It feeds the line plan's people present (today) and the hours
 * the minimum-wage top-up counts. Days of an approved pay period are frozen.
 */
export function AttendanceCard() {
  const [day, setDay] = useState<string | null>(null);
  const q = useQuery(attendanceQueries.day(day));
  return (
    <Card title="Attendance" className="mb-5">
      <label className="mb-3 block max-w-xs text-sm">
        Day
        <input type="date" aria-label="Attendance day" className="field-input" value={day ?? q.data?.day ?? ''} onChange={(e) => setDay(e.target.value || null)} />
      </label>
      {q.data ? <AttendanceForm key={`${q.data.day}-${q.dataUpdatedAt}`} data={q.data} /> : <Spinner />}
      <ErrorNote error={q.error} />
    </Card>
  );
}

function AttendanceForm({ data }: { data: AttendanceDayDto }) {
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
      const h = Number(text);
      if (!Number.isFinite(h) || h < 0 || h > 24) {
        found[p.userId] = 'Give hours from 0 to 24';
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
      {frozen ? <p role="note" className="mb-2 text-sm text-saffron-700">An approved pay period covers this day: its attendance is frozen.</p> : null}
      <p className="mb-2 text-sm text-ink-600">{data.present} in on {data.day}. Enter hours at work (0 for absent); leave blank when not known.</p>
      <table className="text-sm" aria-label={`Attendance on ${data.day}`}>
        <thead><tr className="text-left text-ink-600"><th className="pr-4">Person</th><th className="pr-4">Role</th><th>Hours</th></tr></thead>
        <tbody>
          {data.people.map((p) => (
            <tr key={p.userId}>
              <td className="pr-4">{p.name}</td>
              <td className="pr-4">{p.role}</td>
              <td>
                <input aria-label={`Hours of ${p.name}`} className="field-input w-20" disabled={frozen} value={hours[p.userId] ?? ''} onChange={(e) => setHours((h) => ({ ...h, [p.userId]: e.target.value }))} />
                {errors[p.userId] ? <span className="field-error block">{errors[p.userId]}</span> : null}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
      <ErrorNote error={save.error && !(save.error instanceof ApiError && Object.keys(save.error.fields).length) ? save.error : null} />
      <div className="mt-2 flex items-center gap-3">
        <button type="button" className="btn-primary" disabled={frozen || save.isPending} onClick={handleSave}>{save.isPending ? 'Saving…' : 'Save attendance'}</button>
        {saved ? <span role="status" className="text-sm text-thread-700">Saved.</span> : null}
      </div>
    </>
  );
}
