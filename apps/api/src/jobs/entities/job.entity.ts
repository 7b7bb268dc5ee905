import type { JobStatus } from '@potlife/domain';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import type { StoredRoof } from '@potlife/domain';

export const SUBSTRATES = ['timber-deck', 'osb', 'existing-felt', 'asphalt', 'concrete', 'old-grp'] as const;
export type Substrate = (typeof SUBSTRATES)[number];

/** One piece of work for a customer at a site (GLOSSARY "job"). */
@Entity('jobs')
export class Job {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  /** The company's running job number, shown as J-0001. */
  @Column({ type: 'int' })
  number: number;

  @Column({ name: 'customer_id', type: 'uuid' })
  customerId: string;

  @Column({ type: 'varchar', length: 160 })
  title: string;

  @Column({ name: 'site_address', type: 'text' })
  siteAddress: string;

  @Column({ type: 'varchar', length: 20 })
  substrate: Substrate;

  @Column({ name: 'scheduled_on', type: 'date', nullable: true })
  scheduledOn: string | null;

  @Column({ name: 'estimator_id', type: 'uuid', nullable: true })
  estimatorId: string | null;

  @Column({ type: 'varchar', length: 160, nullable: true })
  crew: string | null;

  @Column({ name: 'topcoat_colour', type: 'varchar', length: 60, nullable: true })
  topcoatColour: string | null;

  @Column({ name: 'build_up_id', type: 'uuid', nullable: true })
  buildUpId: string | null;

  @Column({ type: 'varchar', length: 12, default: 'enquiry' })
  status: JobStatus;

  @Column({ name: 'status_changed_at', type: 'timestamptz' })
  statusChangedAt: Date;

  @Column({ type: 'jsonb', nullable: true })
  roof: StoredRoof | null;

  @Column({ name: 'roof_updated_at', type: 'timestamptz', nullable: true })
  roofUpdatedAt: Date | null;

  @Column({ name: 'accepted_estimate_id', type: 'uuid', nullable: true })
  acceptedEstimateId: string | null;

  @Column({ type: 'text', nullable: true })
  notes: string | null;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}

export const jobReference = (n: number): string => `J-${String(n).padStart(4, '0')}`;
