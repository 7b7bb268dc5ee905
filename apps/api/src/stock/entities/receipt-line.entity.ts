import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/**
 * One material of a receipt: packs received (stocked as one lot) and packs refused at the door
 * (recorded, not stocked). `purchaseOrderLineId` points at the order line it was delivered
 * against, once purchase orders exist.
 */
@Entity('receipt_lines')
export class ReceiptLine {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'receipt_id', type: 'uuid' })
  receiptId: string;

  @Column({ name: 'line_no', type: 'int' })
  lineNo: number;

  @Column({ name: 'material_id', type: 'uuid' })
  materialId: string;

  @Column({ name: 'purchase_order_line_id', type: 'uuid', nullable: true })
  purchaseOrderLineId: string | null;

  @Column({ name: 'batch_number', type: 'varchar', length: 60, nullable: true })
  batchNumber: string | null;

  @Column({ name: 'expires_on', type: 'date', nullable: true })
  expiresOn: string | null;

  @Column({ name: 'expiry_computed', type: 'boolean', default: false })
  expiryComputed: boolean;

  @Column({ name: 'packs_received', type: 'int' })
  packsReceived: number;

  @Column({ name: 'pack_size', type: 'numeric', precision: 14, scale: 3, transformer: decimalString })
  packSize: string;

  @Column({ name: 'packs_refused', type: 'int', default: 0 })
  packsRefused: number;

  @Column({ name: 'refused_reason', type: 'text', nullable: true })
  refusedReason: string | null;

  @Column({ type: 'numeric', precision: 14, scale: 3, transformer: decimalString })
  quantity: string;

  @Column({ name: 'unit_cost', type: 'numeric', precision: 14, scale: 4, transformer: decimalString })
  unitCost: string;

  @Column({ name: 'location_id', type: 'uuid', nullable: true })
  locationId: string | null;

  @Column({ name: 'lot_id', type: 'uuid', nullable: true })
  lotId: string | null;

  @Column({ name: 'over_delivery_allowed_by', type: 'uuid', nullable: true })
  overDeliveryAllowedBy: string | null;
}
