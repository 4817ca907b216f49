import { useMutation, useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import type { CreateFabricInput, FabricDto } from '@shared/schemas/cutting';
import { parseMajor, toMajorText } from '@shared/units/money';
import { ErrorNote } from '@/components/ui/page';
import { ApiError, api } from '@/lib/api-client';
import { useMe } from '@/lib/auth';
import { queryClient } from '@/lib/query-client';
import { purchasingQueries } from '@/features/purchasing/api/purchasing-queries';
import { MM_PER_INCH, MM_PER_YARD } from './cutting-format';


interface Draft {
  name: string;
  composition: string;
  width: string;
  shrinkageLength: string;
  shrinkageWidth: string;
  isDirectional: boolean;
  price: string;
  priceUnit: 'metre' | 'yard';
  supplierId: string;
  maxPlies: string;
}

function draftOf(f: FabricDto | null, imperial: boolean, currency: string): Draft {
  if (!f) return { name: '', composition: '', width: '', shrinkageLength: '0', shrinkageWidth: '0', isDirectional: false, price: '', priceUnit: imperial ? 'yard' : 'metre', supplierId: '', maxPlies: '40' };
  // The price as the supplier quoted it; older fabrics only have a rate per metre.
  const quoted = f.price ?? (f.pricePerMetreMinor === undefined ? undefined : { amountMinor: f.pricePerMetreMinor, per: 'metre' as const });
  return {
    name: f.name,
    composition: f.composition,
    width: imperial ? String(Math.round((f.widthMm / MM_PER_INCH) * 8) / 8) : String(f.widthMm / 10),
    shrinkageLength: String(f.shrinkageLengthPercent ?? f.shrinkagePercent),
    shrinkageWidth: String(f.shrinkageWidthPercent ?? f.shrinkagePercent),
    isDirectional: f.isDirectional,
    price: quoted ? toMajorText(quoted.amountMinor, currency) : '',
    priceUnit: quoted?.per ?? (imperial ? 'yard' : 'metre'),
    supplierId: f.supplierId === null ? '' : String(f.supplierId),
    maxPlies: String(f.maxPlies),
  };
}

/**
 * Add or edit a fabric, lining or interfacing of the studio: cuttable width in the studio's units
 * (cm, or inches), the price per metre or per yard as quoted, shrinkage along and across the grain, one-way, and the supplier it is bought from.
 */
export function FabricForm({ fabric, onDone }: { fabric: FabricDto | null; onDone: (f: FabricDto) => void }) {
  const me = useMe().data;
  const imperial = me?.unitSystem === 'imperial';
  const currency = me?.currency ?? 'KES';
  const suppliers = useQuery(purchasingQueries.suppliers());
  const [d, setD] = useState<Draft>(() => draftOf(fabric, imperial, currency));
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const save = useMutation({
    mutationFn: async (v: CreateFabricInput) =>
      (fabric ? await api.put<{ fabric: FabricDto }>(`/fabrics/${fabric.id}`, v) : await api.post<{ fabric: FabricDto }>('/fabrics', v)).fabric,
    onSuccess: async (f) => {
      await queryClient.invalidateQueries({ queryKey: ['fabrics'] });
      if (!fabric) setD(draftOf(null, imperial, currency));
      onDone(f);
    },
  });
  const serverErrors = save.error instanceof ApiError ? save.error.fields : {};
  const errors = { ...serverErrors, ...localErrors };

  const handleSubmit = (e: FormEvent) => {
    e.preventDefault();
    const problems: Record<string, string> = {};
    const width = Number(d.width);
    if (!d.width.trim() || !Number.isFinite(width) || width <= 0) problems.widthMm = 'Enter the cuttable width, above 0';
    const price = d.price.trim() === '' ? 0 : parseMajor(d.price, currency);
    if (price === null || price < 0) problems.priceMinor = 'Enter a price such as 450.00, or leave it empty';
    for (const [key, field] of [['shrinkageLength', 'shrinkageLengthPercent'], ['shrinkageWidth', 'shrinkageWidthPercent']] as const) {
      const v = Number(d[key] || 0);
      if (!Number.isFinite(v) || v < 0 || v > 30) problems[field] = 'Between 0 and 30 %';
    }
    const plies = Number(d.maxPlies);
    if (!Number.isInteger(plies)) problems.maxPlies = 'Whole plies';
    setLocalErrors(problems);
    if (Object.keys(problems).length) return;
    // Kept exactly as quoted; the rate per metre is only for older readers of the fabric.
    const perMetre = d.priceUnit === 'yard' ? Math.round(((price ?? 0) * 1000) / MM_PER_YARD) : (price ?? 0);
    const shrinkLength = Number(d.shrinkageLength || 0);
    const shrinkWidth = Number(d.shrinkageWidth || 0);
    save.mutate({
      name: d.name,
      composition: d.composition,
      widthMm: Math.round(imperial ? width * MM_PER_INCH : width * 10),
      shrinkagePercent: Math.max(shrinkLength, shrinkWidth),
      shrinkageLengthPercent: shrinkLength,
      shrinkageWidthPercent: shrinkWidth,
      isDirectional: d.isDirectional,
      pricePerMetreMinor: perMetre,
      priceMinor: price ?? 0,
      priceUnit: d.priceUnit,
      supplierId: d.supplierId ? Number(d.supplierId) : null,
      maxPlies: plies,
    });
  };

  const prefix = fabric ? `fabric-${fabric.id}` : 'fabric-new';
  const text = (key: keyof Draft, label: string, errKey: string, type = 'text', hint?: string) => (
    <div>
      <label className="field-label" htmlFor={`${prefix}-${key}`}>{label}</label>
      <input
        id={`${prefix}-${key}`}
        className="field-input"
        type={type}
        step="any"
        inputMode={type === 'number' ? 'decimal' : undefined}
        value={String(d[key])}
        onChange={(e) => setD({ ...d, [key]: e.target.value })}
        aria-invalid={Boolean(errors[errKey])}
        aria-describedby={errors[errKey] ? `${prefix}-${key}-error` : undefined}
      />
      {hint && !errors[errKey] ? <p className="text-xs text-ink-600">{hint}</p> : null}
      {errors[errKey] ? <p id={`${prefix}-${key}-error`} className="field-error">{errors[errKey]}</p> : null}
    </div>
  );

  return (
    <form onSubmit={handleSubmit} className="grid grid-cols-1 gap-3 sm:grid-cols-4 sm:items-start" aria-label={fabric ? `Edit ${fabric.name}` : 'Add a fabric'}>
      {text('name', 'Name', 'name', 'text', 'Self, lining, contrast or interfacing, e.g. "Navy crepe" or "Ivory lining"')}
      {text('composition', 'Composition', 'composition', 'text', 'e.g. 100 % polyester')}
      {text('width', imperial ? 'Cuttable width (in)' : 'Cuttable width (cm)', 'widthMm', 'number', 'Between the selvedges, not the full width')}
      {text('price', `Price per ${d.priceUnit} (${currency})`, 'priceMinor', 'text', 'As the supplier quotes it')}
      <div>
        <label className="field-label" htmlFor={`${prefix}-priceUnit`}>Supplier prices it by the</label>
        <select id={`${prefix}-priceUnit`} className="field-input" value={d.priceUnit} onChange={(e) => setD({ ...d, priceUnit: e.target.value === 'yard' ? 'yard' : 'metre' })}>
          <option value="metre">metre</option>
          <option value="yard">yard</option>
        </select>
      </div>
      {text('shrinkageLength', 'Shrinkage along the grain (%)', 'shrinkageLengthPercent', 'number', 'Lengthwise (warp); pieces are cut longer to make up for it')}
      {text('shrinkageWidth', 'Shrinkage across the grain (%)', 'shrinkageWidthPercent', 'number', 'Widthwise (weft)')}
      {text('maxPlies', 'Most plies in a lay', 'maxPlies', 'number')}
      <div>
        <label className="field-label" htmlFor={`${prefix}-supplier`}>Supplier</label>
        <select id={`${prefix}-supplier`} className="field-input" value={d.supplierId} onChange={(e) => setD({ ...d, supplierId: e.target.value })} aria-invalid={Boolean(errors.supplierId)}>
          <option value="">Not set</option>
          {(suppliers.data ?? []).map((s) => <option key={s.id} value={s.id}>{s.name}</option>)}
        </select>
        {errors.supplierId ? <p className="field-error">{errors.supplierId}</p> : null}
      </div>
      <label className="flex items-center gap-2 pt-6 text-sm">
        <input type="checkbox" checked={d.isDirectional} onChange={(e) => setD({ ...d, isDirectional: e.target.checked })} />
        One way (nap or print): every piece cut in the same direction
      </label>
      <div className="col-span-full flex items-center gap-3">
        <button type="submit" className="btn-primary" disabled={save.isPending}>{fabric ? 'Save fabric' : 'Add fabric'}</button>
        {save.isSuccess ? <p className="text-sm text-thread-800" role="status">Saved.</p> : null}
      </div>
      {save.error && !Object.keys(serverErrors).length ? <div className="col-span-full"><ErrorNote error={save.error} /></div> : null}
    </form>
  );
}
