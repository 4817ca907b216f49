import { useState } from 'react';
import type { CostingLineDto, CostingSheetDto } from '@shared/schemas/costing';
import { ErrorNote } from '@/components/ui/page';
import { useUpdateTrim } from '../api/costing-queries';
import { parseMajor, toMajorText } from '@shared/units/money';
import { MM_PER_YARD } from '@shared/units/units';
import { fmt as formats, formatMoney as money } from '@/lib/format';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';

/** Lines measured in metres (fabric, and trims such as tape or elastic sold by the metre). */
const inMetres = (l: CostingLineDto) => l.unit === 'm';
/** A yard's price from a metre's, for an imperial studio (1 yd = 0.9144 m, NIST SP 811). */
const perYard = (perMetreMinor: number) => Math.round((perMetreMinor * MM_PER_YARD) / 1000);

function PriceInput({ line, sheet }: { line: CostingLineDto; sheet: CostingSheetDto }) {
  const { t } = useTranslation();
  const update = useUpdateTrim();
  // A trim sold by the metre is priced by the yard in an imperial studio, and saved back per metre.
  const byYard = inMetres(line) && formats().settings.unitSystem === 'imperial';
  const [shown] = useState(() => toMajorText(byYard ? perYard(line.priceMinor ?? 0) : (line.priceMinor ?? 0), sheet.currency));
  const [text, setText] = useState(shown);
  const [error, setError] = useState('');
  const save = () => {
    const value = parseMajor(text, sheet.currency);
    if (value === null) return setError(t(`${area}.priceNeeded`, { example: '5.50' }));
    setError('');
    if (byYard && text === shown) return;
    const perMetre = byYard ? Math.round((value * 1000) / MM_PER_YARD) : value;
    if (perMetre !== line.priceMinor) update.mutate({ id: line.refId!, unitPriceMinor: perMetre });
  };
  return (
    <div>
      <input
        aria-label={t(`${area}.unitPriceOf`, { line: line.description })}
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
  const { t } = useTranslation();
  const base = sheet.sizes[Math.floor(sheet.sizes.length / 2)]?.size ?? '';
  const fmt = (v: number) => money(v, sheet.currency);
  const f = formats();
  const imperial = f.settings.unitSystem === 'imperial';
  // Lines in metres come as metres (quantity) and per metre (price): shown in the studio's fabric length, priced by the yard in yards.
  const isMetres = inMetres;
  const quantity = (l: CostingLineDto) => {
    const q = l.quantities[base] ?? 0;
    if (l.percent !== null) return `${f.number(l.percent)} %`;
    if (isMetres(l) && (l.kind === 'fabric' || imperial)) return f.fabricLength(q * 1000);
    return `${f.number(q, 3)} ${t(`${area}.units.${l.unit}`, { defaultValue: l.unit })}`;
  };
  const price = (l: CostingLineDto) =>
    l.priceMinor === null ? '—' : fmt(isMetres(l) && imperial ? perYard(l.priceMinor) : l.priceMinor);
  return (
    <div className="divide-y divide-calico-200 rounded-card border border-calico-200 bg-white text-sm">
      <div className="hidden grid-cols-[1fr_7rem_8rem_8rem] gap-3 bg-thread-700 px-3 py-2 font-medium text-calico-50 sm:grid">
        <span>{t(`${area}.cols.line`)}</span>
        <span className="text-right">{t(`${area}.cols.perGarment`)}</span>
        <span className="text-right">{t(`${area}.cols.unitPrice`)}</span>
        <span className="text-right">{t(`${area}.cols.cost`, { size: base })}</span>
      </div>
      {sheet.lines.map((l, i) => (
        <div key={`${l.kind}-${l.refId ?? i}`} className="grid grid-cols-2 items-center gap-2 px-3 py-2 odd:bg-calico-50 sm:grid-cols-[1fr_7rem_8rem_8rem] sm:gap-3">
          <span className="col-span-2 sm:col-span-1">
            <span className="mr-2 text-xs uppercase tracking-wide text-ink-600">{t(`${area}.kinds.${l.kind}`)}</span>
            {l.description}
          </span>
          <span className="sm:text-right">{quantity(l)}</span>
          <span className="flex sm:justify-end">
            {l.kind === 'trim' && canEdit ? <PriceInput line={l} sheet={sheet} /> : price(l)}
          </span>
          <span className="text-right font-medium">{fmt(l.costMinor[base] ?? 0)}</span>
        </div>
      ))}
    </div>
  );
}
