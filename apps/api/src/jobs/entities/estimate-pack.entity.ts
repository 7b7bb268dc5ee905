import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** Packs of one size to buy for an estimate material, at the cheapest current supplier price. */
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
}
