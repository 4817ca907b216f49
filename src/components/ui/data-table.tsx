import {
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type SortingState,
} from '@tanstack/react-table';
import { useSearchParams } from 'react-router';
import { useTranslation } from '@/lib/i18n';

/**
 * The one table of Seamrun, over TanStack Table. Sort and filter live in the URL query string
 * (?sort=col.desc&q=text) so links and reloads keep them.
 */
export function DataTable<T>({
  data,
  columns,
  filterPlaceholder,
  onRowClick,
  empty,
  urlKey,
  label,
}: {
  data: T[];
  columns: ColumnDef<T, any>[];
  filterPlaceholder?: string;
  onRowClick?: (row: T) => void;
  empty?: string;
  /** Prefix of this table's URL state (`<urlKey>.q`, `<urlKey>.sort`) where a page shows more than one table. */
  urlKey?: string;
  /** The accessible name of the table's scrolling region. */
  label?: string;
}) {
  const { t } = useTranslation();
  const [params, setParams] = useSearchParams();
  const qKey = urlKey ? `${urlKey}.q` : 'q';
  const sortKey = urlKey ? `${urlKey}.sort` : 'sort';
  const q = params.get(qKey) ?? '';
  const sortParam = params.get(sortKey);
  const sorting: SortingState = sortParam
    ? [{ id: sortParam.split('.')[0], desc: sortParam.endsWith('.desc') }]
    : [];
  const table = useReactTable({
    data,
    columns,
    state: { sorting, globalFilter: q },
    onSortingChange: (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      const p = new URLSearchParams(params);
      if (next[0]) p.set(sortKey, `${next[0].id}.${next[0].desc ? 'desc' : 'asc'}`);
      else p.delete(sortKey);
      setParams(p, { replace: true });
    },
    onGlobalFilterChange: (value: string) => {
      const p = new URLSearchParams(params);
      if (value) p.set(qKey, value);
      else p.delete(qKey);
      setParams(p, { replace: true });
    },
    // No pagination here; without this, each re-render (a new `sorting` array) resets the page index,
    // which re-renders again: an endless loop that starves React Router's navigation transitions.
    autoResetPageIndex: false,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  return (
    <div>
      <input
        aria-label={filterPlaceholder ?? t('common.filter')}
        className="field-input mb-3 max-w-xs"
        placeholder={filterPlaceholder ?? t('common.filter')}
        value={q}
        onChange={(e) => table.setGlobalFilter(e.target.value)}
      />
      <div role="region" aria-label={label ?? t('common.table')} tabIndex={0} className="overflow-x-auto rounded-card border border-calico-200 bg-white">
        <table className="min-w-full text-sm">
          <thead className="bg-thread-700 text-left text-calico-50">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => (
                  <th key={h.id} className="px-3 py-2 font-medium">
                    {h.column.getCanSort() ? (
                      <button type="button" className="flex items-center gap-1" onClick={h.column.getToggleSortingHandler()}>
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden>{{ asc: '▲', desc: '▼' }[h.column.getIsSorted() as string] ?? '·'}</span>
                      </button>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr
                key={row.id}
                className={`border-t border-calico-200 odd:bg-calico-50 ${onRowClick ? 'cursor-pointer hover:bg-thread-700/5 focus:outline focus:outline-2 focus:outline-thread-700' : ''}`}
                onClick={onRowClick ? () => onRowClick(row.original) : undefined}
                // A row that opens something opens from the keyboard too: Tab to it, then Enter or Space.
                tabIndex={onRowClick ? 0 : undefined}
                onKeyDown={
                  onRowClick
                    ? (e) => {
                        if (e.target !== e.currentTarget || (e.key !== 'Enter' && e.key !== ' ')) return;
                        e.preventDefault();
                        onRowClick(row.original);
                      }
                    : undefined
                }
              >
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2 align-top">
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {table.getRowModel().rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-600">
                  {empty ?? t('common.noRows')}
                </td>
              </tr>
            ) : null}
          </tbody>
        </table>
      </div>
    </div>
  );
}
