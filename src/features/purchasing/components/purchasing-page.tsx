import { useSuspenseQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { createSupplierInput, type PurchaseOrderDto } from '@shared/schemas/purchasing';
import { DataTable } from '@/components/ui/data-table';
import { Field } from '@/components/ui/form';
import { Card, ErrorNote, PageHeader } from '@/components/ui/page';
import { ApiError, downloadFile } from '@/lib/api-client';
import { purchasingQueries, useAddSupplier, useConfirmOrder, useSendOrder } from '../api/purchasing-queries';
import { orderColumns } from './order-columns';
import { NewOrderForm } from './new-order-form';
import { ReceiveForm } from './receive-form';
import { useTranslation } from '@/lib/i18n';
import { area } from '../words';

function AddSupplier() {
  const { t } = useTranslation();
  const add = useAddSupplier();
  const [v, setV] = useState({ name: '', contact: '', email: '', leadTimeDays: '7' });
  const [errors, setErrors] = useState<Record<string, string>>({});
  const handleSubmit = async (e: React.FormEvent) => {
    e.preventDefault();
    const parsed = createSupplierInput.safeParse({ ...v, leadTimeDays: Number(v.leadTimeDays) });
    if (!parsed.success) return setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
    setErrors({});
    try {
      await add.mutateAsync(parsed.data);
      setV({ name: '', contact: '', email: '', leadTimeDays: '7' });
    } catch (err) {
      if (err instanceof ApiError) setErrors(err.fields);
    }
  };
  const f = (k: keyof typeof v, label: string, type = 'text') => (
    <Field label={label} name={`supplier-${k}`} type={type} value={v[k]} onChange={(e) => setV({ ...v, [k]: e.target.value })} error={errors[k]} />
  );
  return (
    <form onSubmit={handleSubmit} className="grid gap-3 sm:grid-cols-5 sm:items-end" noValidate>
      {f('name', t(`${area}.supplier.name`))}
      {f('contact', t(`${area}.supplier.contact`))}
      {f('email', t(`${area}.supplier.email`), 'email')}
      {f('leadTimeDays', t(`${area}.supplier.leadTime`))}
      <button className="btn-quiet" type="submit" disabled={add.isPending}>{t(`${area}.supplier.add`)}</button>
    </form>
  );
}

export function PurchasingPage() {
  const { t } = useTranslation();
  const { data: suppliers } = useSuspenseQuery(purchasingQueries.suppliers());
  const { data: orders } = useSuspenseQuery(purchasingQueries.orders());
  const { data: studio } = useSuspenseQuery(purchasingQueries.studio());
  const send = useSendOrder();
  const confirm = useConfirmOrder();
  const [receiving, setReceiving] = useState<PurchaseOrderDto | null>(null);
  // The table re-derives its rows whenever `data` changes identity: keep it stable between renders.
  const rows = useMemo(() => orders.map((o) => ({ ...o, currency: studio.currency, actions: actions(o) })),
    [orders, studio.currency, send.isPending, t]);
  function actions(o: PurchaseOrderDto) {
    return (
    <div className="flex flex-wrap gap-1">
      {o.status !== 'received' ? (
        <button
          type="button"
          className="btn-primary px-2 py-1 text-xs"
          aria-label={t(`${area}.sendLabel`, { action: t(`${area}.${o.status === 'draft' ? 'send' : 'sendAgain'}`), number: o.number, supplier: o.supplierName })}
          disabled={send.isPending}
          onClick={() => send.mutate(o.id)}
        >
          {t(`${area}.${o.status === 'draft' ? 'send' : 'sendAgain'}`)}
        </button>
      ) : null}
      {o.status === 'sent' ? <button type="button" className="btn-quiet px-2 py-1 text-xs" onClick={() => confirm.mutate(o.id)}>{t(`${area}.confirmed`)}</button> : null}
      {o.status === 'sent' || o.status === 'confirmed' ? <button type="button" className="btn-quiet px-2 py-1 text-xs" onClick={() => setReceiving(o)}>{t(`${area}.receive`)}</button> : null}
      <button type="button" className="btn-quiet px-2 py-1 text-xs" onClick={() => downloadFile(`/purchasing/orders/${o.id}/xlsx`, `${o.number}.xlsx`)}>{t(`${area}.xlsx`)}</button>
    </div>
    );
  }
  return (
    <>
      <PageHeader title={t(`${area}.title`)} subtitle={t(`${area}.subtitle`)} />
      <div className="space-y-5">
        <Card title={t(`${area}.orders`)}>
          <ErrorNote error={send.error ?? confirm.error} />
          {send.isSuccess ? <p role="status" className="mb-2 text-sm text-thread-800">{t(`${area}.sent`, { number: send.data.order.number, email: send.data.order.supplierEmail })}</p> : null}
          <DataTable data={rows} columns={orderColumns} filterPlaceholder={t(`${area}.filter`)} empty={t(`${area}.empty`)} />
          {receiving ? (
            <ReceiveForm
              key={`${receiving.id}-${receiving.revision}`}
              order={receiving}
              onDone={() => setReceiving(null)}
              // After a refusal as out of date: a fresh form from the order as it now stands (a new receipt).
              onRefill={() => setReceiving(orders.find((o) => o.id === receiving.id) ?? null)}
            />
          ) : null}
        </Card>
        <Card title={t(`${area}.byHand`)}>
          <NewOrderForm />
        </Card>
        <Card title={t(`${area}.suppliers`)}>
          <ul className="mb-4 grid gap-2 sm:grid-cols-2">
            {suppliers.map((s) => (
              <li key={s.id} className="rounded-lg border border-calico-200 bg-white px-3 py-2 text-sm">
                <p className="font-medium text-thread-800">{s.name}</p>
                <p className="text-ink-600">{s.contact ? `${s.contact} · ` : ''}{s.email} · {t(`${area}.leadTime`, { count: s.leadTimeDays })}</p>
              </li>
            ))}
          </ul>
          <AddSupplier />
        </Card>
      </div>
    </>
  );
}
