import { createColumnHelper } from '@tanstack/react-table';
import type { OperationProgress, PersonEfficiency } from '@shared/schemas/floor';
import { formatEfficiency } from '@/lib/format';

const op = createColumnHelper<OperationProgress>();
export const operationProgressColumns = [
  op.accessor('code', { header: 'Op', cell: (i) => <span className="font-mono">{i.getValue()}</span> }),
  op.accessor('name', { header: 'Operation' }),
  op.accessor('section', { header: 'Section' }),
  op.accessor((o) => `${o.bundlesDone} / ${o.bundlesTotal}`, { id: 'done', header: 'Bundles done', enableSorting: false }),
  op.accessor('piecesDone', { header: 'Pieces done' }),
  op.accessor('bundlesReady', { header: 'Waiting here (WIP)' }),
];

const person = createColumnHelper<PersonEfficiency>();
export const efficiencyColumns = [
  person.accessor('name', { header: 'Person' }),
  person.accessor('role', { header: 'Role' }),
  person.accessor('pieces', { header: 'Pieces' }),
  person.accessor('earnedMinutes', { header: 'Standard min earned', cell: (i) => i.getValue().toFixed(1) }),
  person.accessor('attendedMinutes', { header: 'Min worked' }),
  person.accessor('efficiencyPercent', { header: 'Efficiency', cell: (i) => formatEfficiency(i.getValue()) }),
];
