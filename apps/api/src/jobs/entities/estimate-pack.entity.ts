import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** Where a pack row's cost comes from: a supplier's current price, or a lot in stock at its own unit cost. */
export type CostSource = 'supplier' | 'stock';

/**
 * Packs of one size to buy for an estimate material, at the cheapest current supplier price; or,
 * on an estimate costed on stock, what is taken from one lot (source 'stock': packSize is the
 * quantity taken in the stock unit, count 1, packPrice and cost that quantity at the lot's cost).
 */
@Entity('estimate_packs')
export class EstimatePack {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'estimate_material_id', type: 'uuid' })
  estimateMaterialId: string;

  @Column({ name: 'pack_size', type: 'numeric', precision: 14, scale: 3, transformer: decimalString })
  packSize: string;

  @Column({ type: 'varchar', length: 80 })
  label: string;

  @Column({ type: 'int' })
  count: number;

  @Column({
    name: 'pack_price',
    type: 'numeric',
    precision: 14,
    scale: 2,
    nullable: true,
    transformer: decimalString,
  })
  packPrice: string | null;

  @Column({ name: 'supplier_id', type: 'uuid', nullable: true })
  supplierId: string | null;

  @Column({ name: 'supplier_name', type: 'varchar', length: 160, nullable: true })
  supplierName: string | null;

  @Column({ name: 'lead_time_days', type: 'int', nullable: true })
  leadTimeDays: number | null;

  @Column({ type: 'numeric', precision: 14, scale: 2, nullable: true, transformer: decimalString })
  cost: string | null;

  @Column({ type: 'varchar', length: 8, default: 'supplier' })
  source: CostSource;

  @Column({ name: 'lot_id', type: 'uuid', nullable: true })
  lotId: string | null;

  @Column({ name: 'batch_number', type: 'varchar', length: 60, nullable: true })
  batchNumber: string | null;

  /** the lot's cost of one stock unit (stock rows only) */
  @Column({ name: 'unit_cost', type: 'numeric', precision: 14, scale: 4, nullable: true, transformer: decimalString })
  unitCost: string | null;
}
