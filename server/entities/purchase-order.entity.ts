import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { TIMESTAMP } from './column-types';

export interface PurchaseOrderLine {
  kind: 'fabric' | 'trim';
  refId: number;
  item: string;
  unit: string;
  quantity: number;
  unitPriceMinor: number;
  receivedQuantity?: number;
}

@Entity('purchase_orders')
@Index(['studioId', 'number'], { unique: true })
export class PurchaseOrderEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

  /** The order's number in its studio (PO-0007): 1 for a studio's first order, never reused; the id stays for URLs. */
  @Column({ type: 'integer' })
  number: number;

  @Column({ type: 'integer' })
  supplierId: number;

  @Column({ type: 'integer', nullable: true })
  batchId: number | null;

  @Column({ type: 'varchar', length: 12, default: 'draft' })
  status: 'draft' | 'sent' | 'confirmed' | 'received';

  @Column({ type: 'simple-json' })
  lines: PurchaseOrderLine[];

  @Column({ type: 'varchar', length: 10 })
  deliveryDate: string;

  /** Goes up by one with each receipt: a receipt saves only over the revision it read, so two at once never both add stock. */
  @Column({ type: 'integer', default: 0 })
  revision: number;

  /** The keys of the receipts already taken in (newest last): a receipt sent again with its key adds nothing twice. */
  @Column({ type: 'simple-json', nullable: true })
  receiptKeys: string[] | null;

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ type: TIMESTAMP })
  updatedAt: Date;
}
