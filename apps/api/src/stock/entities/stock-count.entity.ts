import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';

export type CountStatus = 'open' | 'submitted' | 'approved' | 'cancelled';
export const COUNT_STATUSES: readonly CountStatus[] = ['open', 'submitted', 'approved', 'cancelled'];

/** Checking what is on the shelf against the ledger (GLOSSARY "count"), of one location and what it holds, or of everything. */
@Entity('stock_counts')
export class StockCount {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ type: 'int' })
  number: number;

  /** null: every location. */
  @Column({ name: 'location_id', type: 'uuid', nullable: true })
  locationId: string | null;

  @Column({ type: 'varchar', length: 10, default: 'open' })
  status: CountStatus;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ name: 'opened_by', type: 'uuid' })
  openedBy: string;

  @Column({ name: 'opened_at', type: 'timestamptz', default: () => 'now()' })
  openedAt: Date;

  @Column({ name: 'submitted_by', type: 'uuid', nullable: true })
  submittedBy: string | null;

  @Column({ name: 'submitted_at', type: 'timestamptz', nullable: true })
  submittedAt: Date | null;

  @Column({ name: 'decided_by', type: 'uuid', nullable: true })
  decidedBy: string | null;

  @Column({ name: 'decided_at', type: 'timestamptz', nullable: true })
  decidedAt: Date | null;

  @Column({ name: 'decision_note', type: 'text', nullable: true })
  decisionNote: string | null;
}
