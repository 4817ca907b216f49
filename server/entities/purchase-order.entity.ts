import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
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
export class PurchaseOrderEntity {
  @PrimaryGeneratedColumn({ type: 'integer' })
  id: number;

  @Column({ type: 'integer' })
  studioId: number;

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

  @CreateDateColumn({ type: TIMESTAMP })
  createdAt: Date;

  @UpdateDateColumn({ type: TIMESTAMP })
  updatedAt: Date;
}
