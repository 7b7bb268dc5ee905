import { Column, Entity, PrimaryColumn, UpdateDateColumn } from 'typeorm';

/** The owner's settings for jobs; a company without a row has the defaults. */
@Entity('company_settings')
export class CompanySettings {
  @PrimaryColumn({ name: 'company_id', type: 'uuid' })
  companyId: string;

  /** Stock reserved for a job must still be in date this many days after the job date. */
  @Column({ name: 'reservation_margin_days', type: 'int', default: 7 })
  reservationMarginDays: number;

  @Column({ name: 'quote_validity_days', type: 'int', default: 30 })
  quoteValidityDays: number;

  @Column({ name: 'updated_by', type: 'uuid', nullable: true })
  updatedBy: string | null;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}

export const DEFAULT_SETTINGS = { reservationMarginDays: 7, quoteValidityDays: 30 } as const;
