import type { HazardClass } from '@potlife/domain';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

export type LocationKind = 'store' | 'bay' | 'shelf' | 'flammables-cabinet' | 'peroxide-store' | 'van' | 'outdoor';
export const LOCATION_KINDS: readonly LocationKind[] = ['store', 'bay', 'shelf', 'flammables-cabinet', 'peroxide-store', 'van', 'outdoor'];

/** A place stock is kept (GLOSSARY "location"). `allowedHazardClasses` lists what it may hold; 'none' is non-dangerous goods. */
@Entity('locations')
export class Location {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'varchar', length: 24 })
  kind: LocationKind;

  @Column({ name: 'parent_id', type: 'uuid', nullable: true })
  parentId: string | null;

  /** Litres of flammable liquid a flammables cabinet may hold (HSE HSG51: 50 L in a workroom). */
  @Column({ name: 'capacity_litres', type: 'numeric', precision: 10, scale: 3, nullable: true, transformer: decimalString })
  capacityLitres: string | null;

  @Column({ name: 'allowed_hazard_classes', type: 'text', array: true, default: () => "'{none}'" })
  allowedHazardClasses: HazardClass[];

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
