import type { JobStatus } from '@potlife/domain';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** One change of a job's status: who, when, why. Appended, never edited. */
@Entity('job_status_changes')
export class JobStatusChange {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'job_id', type: 'uuid' })
  jobId: string;

  @Column({ name: 'from_status', type: 'varchar', length: 12, nullable: true })
  fromStatus: JobStatus | null;

  @Column({ name: 'to_status', type: 'varchar', length: 12 })
  toStatus: JobStatus;

  @Column({ type: 'text', nullable: true })
  reason: string | null;

  @Column({ name: 'changed_by', type: 'uuid', nullable: true })
  changedBy: string | null;

  @CreateDateColumn({ name: 'changed_at', type: 'timestamptz' })
  changedAt: Date;
}
