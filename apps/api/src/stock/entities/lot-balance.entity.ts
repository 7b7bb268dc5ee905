import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** A lot's ledger balance at one location, cached in the same transaction as each movement; never negative. */
@Entity('lot_balances')
export class LotBalance {
  @PrimaryColumn({ name: 'lot_id', type: 'uuid' })
  lotId: string;

  @PrimaryColumn({ name: 'location_id', type: 'uuid' })
  locationId: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ type: 'numeric', precision: 14, scale: 3, transformer: decimalString })
  quantity: string;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
