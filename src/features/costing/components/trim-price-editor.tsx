import { useState } from 'react';
import type { CostingLineDto, CostingSheetDto } from '@shared/schemas/costing';
import { ErrorNote } from '@/components/ui/page';
import { useUpdateTrim } from '../api/costing-queries';
import { parseMajor, toMajorText } from '@shared/units/money';
import { formatMoney as money } from '@/lib/format';

function PriceInput({ line, sheet }: { line: CostingLineDto; sheet: CostingSheetDto }) {
  const update = useUpdateTrim();
  const [text, setText] = useState(toMajorText(line.priceMinor ?? 0, sheet.currency));
  const [error, setError] = useState('');
  const save = () => {
    const value = parseMajor(text, sheet.currency);
    if (value === null) return setError('Enter an amount, e.g. 5.50');
    setError('');
    if (value !== line.priceMinor) update.mutate({ id: line.refId!, unitPriceMinor: value });
  };
  return (
    <div>
      <input
        aria-label={`Unit price, ${line.description}`}
        inputMode="decimal"
        className="field-input w-28 text-right"
        value={text}
        onChange={(e) => setText(e.target.value)}
        onBlur={save}
        onKeyDown={(e) => e.key === 'Enter' && save()}
      />
      {error ? <p className="field-error">{error}</p> : null}
      <ErrorNote error={update.error} />
    </div>
  );
}

/** The bill of materials with an editable unit price per trim; the sheet re-prices on save. */
export function TrimPriceEditor({ sheet, canEdit }: { sheet: CostingSheetDto; canEdit: boolean }) {
  const base = sheet.sizes[Math.floor(sheet.sizes.length / 2)]?.size ?? '';
  const fmt = (v: number) => money(v, sheet.currency);
  return (
    <div className="divide-y divide-calico-200 rounded-card border border-calico-200 bg-white text-sm">
      <div className="hidden grid-cols-[1fr_7rem_8rem_8rem] gap-3 bg-thread-700 px-3 py-2 font-medium text-calico-50 sm:grid">
        <span>Cost line</span><span className="text-right">Per garment</span><span className="text-right">Unit price</span><span className="text-right">Cost ({base})</span>
      </div>
      {sheet.lines.map((l, i) => (
        <div key={`${l.kind}-${l.refId ?? i}`} className="grid grid-cols-2 items-center gap-2 px-3 py-2 odd:bg-calico-50 sm:grid-cols-[1fr_7rem_8rem_8rem] sm:gap-3">
          <span className="col-span-2 sm:col-span-1">
            <span className="mr-2 text-xs uppercase tracking-wide text-ink-600">{l.kind}</span>
            {l.description}
          </span>
          <span className="sm:text-right">{l.percent !== null ? `${l.percent} %` : `${+(l.quantities[base] ?? 0).toFixed(3)} ${l.unit}`}</span>
          <span className="flex sm:justify-end">
            {l.kind === 'trim' && canEdit ? <PriceInput line={l} sheet={sheet} /> : l.priceMinor !== null ? fmt(l.priceMinor) : '—'}
          </span>
          <span className="text-right font-medium">{fmt(l.costMinor[base] ?? 0)}</span>
        </div>
      ))}
    </div>
  );
}
