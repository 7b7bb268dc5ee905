import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** One lot at one location in a count: the ledger's figure when the count opened, and what was counted. */
@Entity('stock_count_lines')
export class StockCountLine {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'count_id', type: 'uuid' })
  countId: string;

  @Column({ name: 'lot_id', type: 'uuid' })
  lotId: string;

  @Column({ name: 'location_id', type: 'uuid' })
  locationId: string;

  @Column({ name: 'expected_quantity', type: 'numeric', precision: 14, scale: 3, transformer: decimalString })
  expectedQuantity: string;

  @Column({ name: 'counted_quantity', type: 'numeric', precision: 14, scale: 3, nullable: true, transformer: decimalString })
  countedQuantity: string | null;

  @Column({ name: 'unit_cost', type: 'numeric', precision: 14, scale: 4, transformer: decimalString })
  unitCost: string;

  /** A lot found on the shelf that the ledger did not place there when the count opened. */
  @Column({ name: 'found_during_count', type: 'boolean', default: false })
  foundDuringCount: boolean;

  @Column({ name: 'counted_by', type: 'uuid', nullable: true })
  countedBy: string | null;

  @Column({ name: 'counted_at', type: 'timestamptz', nullable: true })
  countedAt: Date | null;
}
