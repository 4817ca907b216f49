import { createColumnHelper } from '@tanstack/react-table';
import type { OperationProgress, PersonEfficiency } from '@shared/schemas/floor';
import { fmt, formatEfficiency } from '@/lib/format';
import { i18n } from '@/lib/i18n';
import { area } from '../words';

const col = (key: string) => () => i18n.t(`${area}.progress.cols.${key}`);

const op = createColumnHelper<OperationProgress>();
export const operationProgressColumns = [
  op.accessor('code', { header: col('op'), cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  op.accessor('name', { header: col('operation') }),
  op.accessor('section', { header: col('section'), cell: (i) => i18n.t(`${area}.sections.${i.getValue()}`) }),
  op.accessor((o) => `${o.bundlesDone} / ${o.bundlesTotal}`, { id: 'done', header: col('bundlesDone'), enableSorting: false }),
  op.accessor('piecesDone', { header: col('piecesDone'), cell: (i) => fmt().number(i.getValue()) }),
  op.accessor('bundlesReady', { header: col('waiting') }),
];

const person = createColumnHelper<PersonEfficiency>();
export const efficiencyColumns = [
  person.accessor('name', { header: col('person') }),
  person.accessor('role', { header: col('role'), cell: (i) => i18n.t(`roles.${i.getValue()}`, { defaultValue: i.getValue() }) }),
  person.accessor('pieces', { header: col('pieces'), cell: (i) => fmt().number(i.getValue()) }),
  person.accessor('earnedMinutes', { header: col('earned'), cell: (i) => new Intl.NumberFormat(fmt().locale, { minimumFractionDigits: 1, maximumFractionDigits: 1 }).format(i.getValue()) }),
  person.accessor('attendedMinutes', { header: col('worked'), cell: (i) => fmt().number(i.getValue()) }),
  person.accessor('efficiencyPercent', { header: col('efficiency'), cell: (i) => formatEfficiency(i.getValue()) }),
];
