import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** Hours one crew member worked on a job on one day. Struck out, never deleted. */
@Entity('job_labour_entries')
export class LabourEntry {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'job_id', type: 'uuid' })
  jobId: string;

  @Column({ name: 'worked_on', type: 'date' })
  workedOn: string;

  @Column({ type: 'numeric', precision: 5, scale: 2, transformer: decimalString })
  hours: string;

  @Column({ name: 'crew_member', type: 'varchar', length: 120 })
  crewMember: string;

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'removed_at', type: 'timestamptz', nullable: true })
  removedAt: Date | null;

  @Column({ name: 'removed_by', type: 'uuid', nullable: true })
  removedBy: string | null;

  @Column({ name: 'remove_reason', type: 'text', nullable: true })
  removeReason: string | null;
}
