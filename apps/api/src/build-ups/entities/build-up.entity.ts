import type { BuildUpRates } from '@potlife/domain';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn, UpdateDateColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** A company's named build-up (GLOSSARY "build-up"): the engine's rates, labour rate, markup and VAT. */
@Entity('build_ups')
export class BuildUp {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ type: 'varchar', length: 120 })
  name: string;

  @Column({ type: 'text', nullable: true })
  description: string | null;

  @Column({ type: 'jsonb' })
  rates: BuildUpRates;

  /** £ per labour hour */
  @Column({ name: 'labour_rate', type: 'numeric', precision: 10, scale: 2, transformer: decimalString })
  labourRate: string;

  @Column({ name: 'markup_pct', type: 'numeric', precision: 6, scale: 2, transformer: decimalString })
  markupPct: string;

  @Column({ name: 'vat_rate_pct', type: 'numeric', precision: 5, scale: 2, transformer: decimalString })
  vatRatePct: string;

  @Column({ type: 'boolean', default: true })
  active: boolean;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @UpdateDateColumn({ name: 'updated_at', type: 'timestamptz' })
  updatedAt: Date;
}
