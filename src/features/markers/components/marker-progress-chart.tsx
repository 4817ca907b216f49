import { CartesianGrid, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { MarkerProgressPointDto } from '@shared/schemas/markers';
import { useTranslation } from '@/lib/i18n';
import { useFormat } from '@/lib/format';
import { area } from '../words';

const C = { teal: '#0F4C5C', saffron: '#D99A1E', calico: '#E8DFCF', ink: '#434B50' };
const axis = { fontSize: 11, fill: C.ink };

/**
 * A marker run's best length (left axis, the studio's fabric unit) and density (right axis, %) against
 * the seconds elapsed; both hold their value until the next improvement. Loaded on its own (recharts
 * stays out of the markers page's chunk until a run has points to draw).
 */
export function MarkerProgressChart({ points }: { points: MarkerProgressPointDto[] }) {
  const { t } = useTranslation();
  const f = useFormat();
  const data = points.map((p) => ({ s: p.elapsedMs / 1000, length: p.lengthMm, density: p.utilisation * 100 }));
  return (
    <figure className="mt-3" data-testid="marker-progress-chart">
      <figcaption className="text-xs font-medium text-ink-600">{t(`${area}.chartTitle`)}</figcaption>
      <div className="h-48 w-full" role="img" aria-label={t(`${area}.chartLabel`)}>
        <ResponsiveContainer>
          <LineChart data={data} margin={{ top: 8, right: 8, left: 8, bottom: 0 }}>
            <CartesianGrid stroke={C.calico} vertical={false} />
            <XAxis dataKey="s" type="number" domain={[0, 'dataMax']} tick={axis} tickFormatter={(v: number) => t(`${area}.seconds`, { value: f.number(v, 0) })} />
            <YAxis yAxisId="length" tick={axis} width={64} domain={['auto', 'auto']} tickFormatter={(v: number) => f.fabricLength(v)} />
            <YAxis yAxisId="density" orientation="right" tick={axis} width={48} domain={['auto', 'auto']} tickFormatter={(v: number) => f.percent(v, 0)} />
            <Tooltip
              labelFormatter={(v) => t(`${area}.seconds`, { value: f.number(Number(v), 1) })}
              formatter={(v, name) => (name === 'length' ? [f.fabricLength(Number(v)), t(`${area}.length`)] : [f.percent(Number(v), 2), t(`${area}.density`)])}
            />
            <Line yAxisId="length" dataKey="length" type="stepAfter" stroke={C.teal} dot={false} isAnimationActive={false} />
            <Line yAxisId="density" dataKey="density" type="stepAfter" stroke={C.saffron} dot={false} isAnimationActive={false} />
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
