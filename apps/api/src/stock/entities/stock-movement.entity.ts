import type { MovementKind } from '@potlife/domain';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

export const MOVEMENT_KINDS: readonly MovementKind[] = ['receipt', 'transfer', 'issue', 'return', 'adjustment', 'write-off'];

/** Why stock was written off. */
export type WriteOffReason = 'expired' | 'damaged' | 'temperature';
export const WRITE_OFF_REASONS: readonly WriteOffReason[] = ['expired', 'damaged', 'temperature'];

/**
 * One appended line of the stock ledger (GLOSSARY "movement"): it changes one lot's balance at
 * `locationId` by a signed `quantity` (+ in, − out). A transfer is two rows sharing `operationId`.
 * Never updated or deleted (a database trigger refuses it); a mistake is reversed by a new row
 * with `reversesMovementId`.
 */
@Entity('stock_movements')
export class StockMovement {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'operation_id', type: 'uuid' })
  operationId: string;

  @Column({ type: 'varchar', length: 12 })
  kind: MovementKind;

  @Column({ name: 'lot_id', type: 'uuid' })
  lotId: string;

  @Column({ name: 'material_id', type: 'uuid' })
  materialId: string;

  @Column({ name: 'location_id', type: 'uuid' })
  locationId: string;

  @Column({ name: 'from_location_id', type: 'uuid', nullable: true })
  fromLocationId: string | null;

  @Column({ name: 'to_location_id', type: 'uuid', nullable: true })
  toLocationId: string | null;

  @Column({ type: 'numeric', precision: 14, scale: 3, transformer: decimalString })
  quantity: string;

  @Column({ name: 'unit_cost', type: 'numeric', precision: 14, scale: 4, transformer: decimalString })
  unitCost: string;

  @Column({ type: 'varchar', length: 120, nullable: true })
  reason: string | null;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ name: 'user_id', type: 'uuid' })
  userId: string;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'job_id', type: 'uuid', nullable: true })
  jobId: string | null;

  @Column({ name: 'receipt_line_id', type: 'uuid', nullable: true })
  receiptLineId: string | null;

  @Column({ name: 'count_id', type: 'uuid', nullable: true })
  countId: string | null;

  @Column({ name: 'reverses_movement_id', type: 'uuid', nullable: true })
  reversesMovementId: string | null;
}
