import type { EdgeKind, HazardClass, MaterialKind } from '@potlife/domain';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

export type StockUnit = 'kg' | 'L' | 'm2' | 'm' | 'each';
export const STOCK_UNITS: readonly StockUnit[] = ['kg', 'L', 'm2', 'm', 'each'];

/** What a trim is: a straight length, or a corner piece (external or internal). Trims only. */
export type TrimPiece = 'length' | 'external-corner' | 'internal-corner';
export const TRIM_PIECES: readonly TrimPiece[] = ['length', 'external-corner', 'internal-corner'];

/** A pack a material is bought and stored in: `size` in the stock unit, e.g. {size: "25", label: "25 kg drum"}. */
export interface PackSize {
  size: string;
  label: string;
}

/** A thing the company stocks (GLOSSARY "material"). Quantities are decimal strings in `stockUnit`. */
@Entity('materials')
export class Material {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  /** The company's own short code, unique within the company; CSV imports match on it. */
  @Column({ type: 'varchar', length: 40 })
  code: string;

  @Column({ type: 'varchar', length: 160 })
  name: string;

  @Column({ type: 'varchar', length: 20 })
  kind: MaterialKind;

  @Column({ name: 'stock_unit', type: 'varchar', length: 8 })
  stockUnit: StockUnit;

  @Column({ name: 'pack_sizes', type: 'jsonb', default: () => "'[]'" })
  packSizes: PackSize[];

  @Column({ name: 'lot_tracked', type: 'boolean', default: true })
  lotTracked: boolean;

  @Column({ name: 'shelf_life_days', type: 'int', nullable: true })
  shelfLifeDays: number | null;

  @Column({ name: 'storage_min_c', type: 'numeric', precision: 5, scale: 1, nullable: true, transformer: decimalString })
  storageMinC: string | null;

  @Column({ name: 'storage_max_c', type: 'numeric', precision: 5, scale: 1, nullable: true, transformer: decimalString })
  storageMaxC: string | null;

  /** 'none' or a UN hazard class ('3' flammable liquid, '5.2' organic peroxide, '8' corrosive…). */
  @Column({ name: 'hazard_class', type: 'varchar', length: 4, default: 'none' })
  hazardClass: HazardClass;

  @Column({ name: 'un_number', type: 'varchar', length: 6, nullable: true })
  unNumber: string | null;

  @Column({ name: 'packing_group', type: 'varchar', length: 3, nullable: true })
  packingGroup: 'I' | 'II' | 'III' | null;

  /** °C; flammables below room temperature count against a cabinet's 50 L (HSE HSG51). */
  @Column({ name: 'flash_point_c', type: 'numeric', precision: 5, scale: 1, nullable: true, transformer: decimalString })
  flashPointC: string | null;

  /** Accelerators are kept apart from organic peroxide even when not class 3. */
  @Column({ name: 'is_accelerator', type: 'boolean', default: false })
  isAccelerator: boolean;

  @Column({ name: 'reorder_level', type: 'numeric', precision: 14, scale: 3, default: 0, transformer: decimalString })
  reorderLevel: string;

  @Column({ name: 'reorder_quantity', type: 'numeric', precision: 14, scale: 3, default: 0, transformer: decimalString })
  reorderQuantity: string;

  @Column({ name: 'mat_gsm', type: 'int', nullable: true })
  matGsm: number | null;

  @Column({ name: 'roll_width_m', type: 'numeric', precision: 6, scale: 3, nullable: true, transformer: decimalString })
  rollWidthM: string | null;

  @Column({ name: 'trim_kind', type: 'varchar', length: 10, nullable: true })
  trimKind: EdgeKind | null;

  @Column({ name: 'trim_length_m', type: 'numeric', precision: 6, scale: 3, nullable: true, transformer: decimalString })
  trimLengthM: string | null;

  /** null for anything but a trim; a trim without one is a length */
  @Column({ name: 'trim_piece', type: 'varchar', length: 16, nullable: true })
  trimPiece: TrimPiece | null;

  @Column({ name: 'topcoat_colour', type: 'varchar', length: 60, nullable: true })
  topcoatColour: string | null;

  /** Litres per kg for liquids stocked by weight (capacity checks of flammables cabinets). */
  @Column({ name: 'litres_per_kg', type: 'numeric', precision: 8, scale: 4, nullable: true, transformer: decimalString })
  litresPerKg: string | null;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
