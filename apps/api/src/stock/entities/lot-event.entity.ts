import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

export type LotEventKind = 'quarantined' | 'released' | 'flagged' | 'flag-cleared' | 'written-off';

/** Who changed a lot's status or exposure flag, when, and why. */
@Entity('lot_events')
export class LotEvent {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'lot_id', type: 'uuid' })
  lotId: string;

  @Column({ type: 'varchar', length: 16 })
  kind: LotEventKind;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ name: 'reading_id', type: 'uuid', nullable: true })
  readingId: string | null;

  @Column({ name: 'user_id', type: 'uuid', nullable: true })
  userId: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
