import { queryOptions, useMutation } from '@tanstack/react-query';
import type { MailMessageDto } from '@shared/schemas/mail';
import type { CreateOrderInput, CreateSupplierInput, OrderableItemDto, NeedDto, PurchaseOrderDto, ReceiveOrderInput, SupplierDto } from '@shared/schemas/purchasing';
import { api } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';
import { batchQueries, studioQueries } from '@/lib/queries';

export const purchasingQueries = {
  all: () => ({ queryKey: ['purchasing'] as const }),
  suppliers: () => queryOptions({ queryKey: ['purchasing', 'suppliers'], queryFn: async () => (await api.get<{ suppliers: SupplierDto[] }>('/purchasing/suppliers')).suppliers }),
  orders: () => queryOptions({ queryKey: ['purchasing', 'orders'], queryFn: async () => (await api.get<{ orders: PurchaseOrderDto[] }>('/purchasing/orders')).orders }),
  studio: studioQueries.detail,
  items: () => queryOptions({ queryKey: ['purchasing', 'items'], queryFn: async () => (await api.get<{ items: OrderableItemDto[] }>('/purchasing/items')).items }),
  batches: batchQueries.list,
  needs: (batchId: number) =>
    queryOptions({ queryKey: ['purchasing', 'needs', batchId], queryFn: async () => (await api.get<{ needs: NeedDto[] }>(`/purchasing/batches/${batchId}/needs`)).needs }),
};

export const outboxQueries = {
  all: () => ({ queryKey: ['outbox'] as const }),
  list: () => queryOptions({ queryKey: ['outbox', 'list'], queryFn: async () => (await api.get<{ messages: MailMessageDto[] }>('/mail/outbox')).messages }),
};

const invalidate = () =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: purchasingQueries.all().queryKey }),
    queryClient.invalidateQueries({ queryKey: outboxQueries.all().queryKey }),
  ]);

export const useAddSupplier = () =>
  useMutation({ mutationFn: (v: CreateSupplierInput) => api.post<{ supplier: SupplierDto }>('/purchasing/suppliers', v), onSuccess: invalidate });

export const useCreateOrders = () =>
  useMutation({
    mutationFn: (batchId: number) => api.post<{ orders: PurchaseOrderDto[]; unassigned: NeedDto[] }>(`/purchasing/batches/${batchId}/orders`, {}),
    onSuccess: invalidate,
  });

export const useCreateOrder = () =>
  useMutation({ mutationFn: (v: CreateOrderInput) => api.post<{ order: PurchaseOrderDto }>('/purchasing/orders', v), onSuccess: invalidate });

export const useSendOrder = () =>
  useMutation({ mutationFn: (id: number) => api.post<{ order: PurchaseOrderDto }>(`/purchasing/orders/${id}/send`), onSuccess: invalidate });

export const useConfirmOrder = () =>
  useMutation({ mutationFn: (id: number) => api.post<{ order: PurchaseOrderDto }>(`/purchasing/orders/${id}/status`, { status: 'confirmed' }), onSuccess: invalidate });

export const useReceiveOrder = () =>
  useMutation({
    mutationFn: ({ id, ...body }: ReceiveOrderInput & { id: number }) => api.post<{ order: PurchaseOrderDto }>(`/purchasing/orders/${id}/receive`, body),
    // Refused too: a receipt refused as out of date shows the order as it now stands behind the form.
    onSettled: invalidate,
  });
