import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** Stored statuses of a lot. `expired` is also shown for an available lot past its expiry date. */
export type LotStatus = 'available' | 'quarantined' | 'expired' | 'written-off';
export const LOT_STATUSES: readonly LotStatus[] = ['available', 'quarantined', 'expired', 'written-off'];

/**
 * The packs of one material from one batch in one delivery, with one expiry date (GLOSSARY "lot").
 * `quantity` is the ledger balance over all locations, cached in the same transaction as each
 * movement; `lot_balances` holds it per location. `locationId` is where the lot was put away, and
 * follows it when the whole of it moves.
 */
@Entity('lots')
export class Lot {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'material_id', type: 'uuid' })
  materialId: string;

  @Column({ name: 'batch_number', type: 'varchar', length: 60, nullable: true })
  batchNumber: string | null;

  @Column({ name: 'received_on', type: 'date' })
  receivedOn: string;

  @Column({ name: 'expires_on', type: 'date', nullable: true })
  expiresOn: string | null;

  @Column({ name: 'location_id', type: 'uuid' })
  locationId: string;

  @Column({ type: 'varchar', length: 12, default: 'available' })
  status: LotStatus;

  /** £ per stock unit of the material. */
  @Column({ name: 'unit_cost', type: 'numeric', precision: 14, scale: 4, transformer: decimalString })
  unitCost: string;

  @Column({ type: 'numeric', precision: 14, scale: 3, default: 0, transformer: decimalString })
  quantity: string;

  @Column({ name: 'receipt_id', type: 'uuid', nullable: true })
  receiptId: string | null;

  @Column({ name: 'exposure_flagged', type: 'boolean', default: false })
  exposureFlagged: boolean;

  @Column({ name: 'exposure_reason', type: 'text', nullable: true })
  exposureReason: string | null;

  @Column({ name: 'exposure_flagged_at', type: 'timestamptz', nullable: true })
  exposureFlaggedAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
