import type { LineRole, MaterialKind, Unit } from '@potlife/domain';
import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** One line of the take-off as estimateRoof gave it: a role, its quantity (unrounded) and the material it maps to. */
@Entity('estimate_lines')
export class EstimateLine {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'estimate_id', type: 'uuid' })
  estimateId: string;

  @Column({ type: 'int' })
  position: number;

  @Column({ type: 'varchar', length: 20 })
  role: LineRole;

  @Column({ name: 'material_kind', type: 'varchar', length: 20 })
  materialKind: MaterialKind;

  @Column({ type: 'text' })
  description: string;

  @Column({ type: 'varchar', length: 4 })
  unit: Unit;

  @Column({ type: 'numeric', transformer: decimalString })
  quantity: string;

  @Column({ type: 'int', nullable: true })
  lengths: number | null;

  @Column({ type: 'numeric', nullable: true, transformer: decimalString })
  metres: string | null;

  @Column({ name: 'material_id', type: 'uuid', nullable: true })
  materialId: string | null;
}
