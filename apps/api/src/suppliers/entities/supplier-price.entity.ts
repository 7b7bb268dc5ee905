import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/**
 * The price of one pack of a material from a supplier, from `validFrom` on. Never updated: a new
 * price is a new row, so the history stays. The current price on a date is the row with the
 * latest validFrom ≤ that date.
 */
@Entity('supplier_prices')
export class SupplierPrice {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'supplier_id', type: 'uuid' })
  supplierId: string;

  @Column({ name: 'material_id', type: 'uuid' })
  materialId: string;

  /** In the material's stock unit (25 for a 25 kg drum). */
  @Column({ name: 'pack_size', type: 'numeric', precision: 14, scale: 3, transformer: decimalString })
  packSize: string;

  /** Net of VAT, pounds. */
  @Column({ name: 'pack_price', type: 'numeric', precision: 14, scale: 2, transformer: decimalString })
  packPrice: string;

  @Column({ name: 'valid_from', type: 'date' })
  validFrom: string;

  @Column({ name: 'supplier_code', type: 'varchar', length: 60, nullable: true })
  supplierCode: string | null;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
