import { limitText, MAX_ORDER_LINES, MAX_ROLL_LENGTH_MM, MAX_STOCK_QUANTITY } from './limits';
import { z } from 'zod';
import { calendarDate, safeText } from './common';

export const PO_STATUSES = ['draft', 'sent', 'confirmed', 'received'] as const;
export type PoStatus = (typeof PO_STATUSES)[number];

export const createSupplierInput = z.object({
  name: safeText(120).min(2, 'Name the supplier'),
  contact: safeText(120).default(''),
  email: z.string().trim().email('Enter an e-mail address').max(200),
  leadTimeDays: z.number({ error: 'Enter a lead time' }).int('Whole days').min(0, 'Cannot be negative').max(365, 'At most 365 days').default(7),
});
export type CreateSupplierInput = z.input<typeof createSupplierInput>;
export const updateSupplierInput = createSupplierInput.partial();

export interface SupplierDto {
  id: number;
  name: string;
  contact: string;
  email: string;
  leadTimeDays: number;
}

/** One material a batch needs, net of stock and of what is already on order. */
export interface NeedDto {
  kind: 'fabric' | 'trim';
  refId: number;
  item: string;
  /** mm for fabric, the trim's unit otherwise. */
  unit: string;
  required: number;
  inStock: number;
  onOrder: number;
  toOrder: number;
  unitPriceMinor: number;
  supplierId: number | null;
  supplierName: string;
}

export interface PurchaseOrderLineDto {
  kind: 'fabric' | 'trim';
  refId: number;
  item: string;
  unit: string;
  quantity: number;
  unitPriceMinor: number;
  lineTotalMinor: number;
  receivedQuantity: number;
}

/** The number an order goes by with its supplier: PO-0007, from its number in its studio (never its id). */
export const poNumber = (order: { number: number }) => `PO-${String(order.number).padStart(4, '0')}`;

export interface PurchaseOrderDto {
  id: number;
  number: string;
  supplierId: number;
  supplierName: string;
  supplierEmail: string;
  batchId: number | null;
  status: PoStatus;
  deliveryDate: string;
  lines: PurchaseOrderLineDto[];
  totalMinor: number;
  /** Up by one with each receipt; a receipt form sends the revision it was filled from. */
  revision: number;
  createdAt: string;
  updatedAt: string;
}

export const createOrdersInput = z.object({
  /** Only needs of these kinds; both when omitted. */
  kinds: z.array(z.enum(['fabric', 'trim'])).min(1).default(['fabric', 'trim']),
});

/** An order made by hand: the supplier, optionally a batch, and quantities of known fabrics and trims. */
export const createOrderInput = z.object({
  supplierId: z.number({ error: 'Pick a supplier' }).int().positive('Pick a supplier'),
  batchId: z.number().int().positive().nullable().default(null),
  lines: z
    .array(
      z.object({
        kind: z.enum(['fabric', 'trim']),
        refId: z.number().int().positive(),
        /** mm for fabric, the trim's unit otherwise. */
        quantity: z.number({ error: 'Enter a quantity' }).positive('Must be more than 0').max(MAX_STOCK_QUANTITY, `At most ${limitText(MAX_STOCK_QUANTITY)}`),
      }),
    )
    .min(1, 'Add at least one line')
    .max(MAX_ORDER_LINES, `At most ${MAX_ORDER_LINES} lines`),
});
export type CreateOrderInput = z.input<typeof createOrderInput>;

/** Something the studio buys: a fabric or a trim, with its price and usual supplier. */
export interface OrderableItemDto {
  kind: 'fabric' | 'trim';
  refId: number;
  item: string;
  unit: string;
  unitPriceMinor: number;
  supplierId: number | null;
}

export const updateOrderStatusInput = z.object({ status: z.enum(['confirmed']) });

const rollInput = z.object({
  label: safeText(40).min(1, 'Label the roll'),
  lengthMm: z.number({ error: 'Enter the roll length' }).positive('Must be longer than 0').max(MAX_ROLL_LENGTH_MM, `At most ${limitText(MAX_ROLL_LENGTH_MM)} mm (1 km)`),
  shadeLot: safeText(40).min(1, 'Give the shade lot'),
});

export const receiveOrderInput = z.object({
  /**
   * This receipt's own key, made once by the form (or the caller) and sent again unchanged on a retry: a receipt
   * whose key the order already holds adds nothing a second time.
   */
  receiptKey: z
    .string({ error: 'Send a key for this receipt' })
    .min(8, 'Key too short')
    .max(64, 'Key too long')
    .regex(/^[A-Za-z0-9_.:-]+$/, 'Letters, digits and - _ . : only'),
  /** The order's revision the form was filled from: a receipt made from an out-of-date form is refused. */
  revision: z.number().int().min(0).optional(),
  receivedDate: calendarDate.optional(),
  lines: z
    .array(
      z.object({
        index: z.number().int().min(0).max(MAX_ORDER_LINES - 1, 'No such line on this order'),
        /** Trim lines: quantity received. Fabric lines: the rolls received. */
        quantity: z.number().min(0, 'Cannot be negative').max(MAX_STOCK_QUANTITY, `At most ${limitText(MAX_STOCK_QUANTITY)} in one receipt`).optional(),
        rolls: z.array(rollInput).max(200).optional(),
      }),
    )
    .min(1, 'Receive at least one line')
    .max(MAX_ORDER_LINES, `At most ${MAX_ORDER_LINES} lines`),
});
export type ReceiveOrderInput = z.input<typeof receiveOrderInput>;
