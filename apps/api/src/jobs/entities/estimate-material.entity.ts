import type { LineRole, MaterialKind } from '@potlife/domain';
import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** What to buy of one catalogue material for an estimate: its lines summed in the stock unit, then packs and cost. */
@Entity('estimate_materials')
export class EstimateMaterial {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'estimate_id', type: 'uuid' })
  estimateId: string;

  @Column({ type: 'int' })
  position: number;

  @Column({ type: 'text', array: true })
  roles: LineRole[];

  @Column({ name: 'material_kind', type: 'varchar', length: 20 })
  materialKind: MaterialKind;

  @Column({ name: 'material_id', type: 'uuid', nullable: true })
  materialId: string | null;

  @Column({ name: 'material_name', type: 'varchar', length: 160, nullable: true })
  materialName: string | null;

  @Column({ name: 'stock_unit', type: 'varchar', length: 8, nullable: true })
  stockUnit: string | null;

  /** in the stock unit when there is a material, else in the lines' unit */
  @Column({ type: 'numeric', transformer: decimalString })
  quantity: string;

  /** what is costed from lots in stock (estimates on stock cost), in the stock unit */
  @Column({ name: 'stock_quantity', type: 'numeric', default: 0, transformer: decimalString })
  stockQuantity: string;

  @Column({ name: 'pack_total', type: 'numeric', nullable: true, transformer: decimalString })
  packTotal: string | null;

  @Column({ type: 'numeric', nullable: true, transformer: decimalString })
  leftover: string | null;

  /** null when any pack has no price */
  @Column({ type: 'numeric', precision: 14, scale: 2, nullable: true, transformer: decimalString })
  cost: string | null;

  /** why it could not be costed: no material in the catalogue, no pack sizes, no price */
  @Column({ type: 'text', nullable: true })
  problem: string | null;
}
