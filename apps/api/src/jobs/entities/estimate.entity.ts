import type { Caution } from '@potlife/domain';
import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';
import type { BuildUpRates } from '@potlife/domain';
import type { StoredRoof } from '@potlife/domain';

/** What the estimate was priced with: the build-up's rates and money settings at the time. */
export interface BuildUpSnapshot {
  rates: BuildUpRates;
  labourRate: string;
  markupPct: string;
  vatRatePct: string;
}

export type CostBasis = 'supplier' | 'stock';
export const COST_BASES: readonly CostBasis[] = ['supplier', 'stock'];

const money = { type: 'numeric' as const, precision: 14, scale: 2, transformer: decimalString };
/** Quantities and hours exactly as the domain gave them (numeric without a scale). */
const qty = { type: 'numeric' as const, transformer: decimalString };

/** A priced take-off of a job's roof, numbered by version (GLOSSARY "estimate"). Never edited once made, except its acceptance. */
@Entity('estimates')
export class Estimate {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'job_id', type: 'uuid' })
  jobId: string;

  @Column({ type: 'int' })
  version: number;

  @Column({ name: 'build_up_id', type: 'uuid', nullable: true })
  buildUpId: string | null;

  @Column({ name: 'build_up_name', type: 'varchar', length: 120 })
  buildUpName: string;

  @Column({ name: 'build_up', type: 'jsonb' })
  buildUp: BuildUpSnapshot;

  @Column({ type: 'jsonb' })
  roof: StoredRoof;

  @Column({ name: 'priced_on', type: 'date' })
  pricedOn: string;

  /** supplier: every pack at current supplier prices; stock: what the job can reserve at its lots' cost, the rest bought */
  @Column({ name: 'cost_basis', type: 'varchar', length: 8, default: 'supplier' })
  costBasis: CostBasis;

  @Column({ name: 'air_c', ...qty })
  airC: string;

  @Column({ name: 'catalyst_pct', ...qty })
  catalystPct: string;

  @Column({ name: 'deck_area_m2', ...qty })
  deckAreaM2: string;

  @Column({ name: 'upstand_area_m2', ...qty })
  upstandAreaM2: string;

  @Column({ name: 'laminated_area_m2', ...qty })
  laminatedAreaM2: string;

  @Column({ name: 'trim_m', ...qty })
  trimM: string;

  @Column({ name: 'corners_external', type: 'int' })
  cornersExternal: number;

  @Column({ name: 'corners_internal', type: 'int' })
  cornersInternal: number;

  @Column({ name: 'corners_derived', type: 'boolean' })
  cornersDerived: boolean;

  @Column({ type: 'int' })
  pipes: number;

  @Column({ type: 'int' })
  outlets: number;

  @Column({ name: 'laminating_hours', ...qty })
  laminatingHours: string;

  @Column({ name: 'trim_hours', ...qty })
  trimHours: string;

  @Column({ name: 'labour_hours', ...qty })
  labourHours: string;

  @Column({ name: 'labour_rate', type: 'numeric', precision: 10, scale: 2, transformer: decimalString })
  labourRate: string;

  @Column({ name: 'material_cost', ...money })
  materialCost: string;

  @Column({ name: 'labour_cost', ...money })
  labourCost: string;

  @Column({ name: 'markup_pct', type: 'numeric', precision: 6, scale: 2, transformer: decimalString })
  markupPct: string;

  @Column(money)
  markup: string;

  @Column(money)
  net: string;

  @Column({ name: 'vat_rate_pct', type: 'numeric', precision: 5, scale: 2, transformer: decimalString })
  vatRatePct: string;

  @Column(money)
  vat: string;

  @Column(money)
  gross: string;

  /** materials on it without a price (left out of the material cost) */
  @Column({ type: 'int', default: 0 })
  unpriced: number;

  @Column({ type: 'jsonb', default: () => "'[]'" })
  cautions: Caution[];

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ name: 'created_by', type: 'uuid', nullable: true })
  createdBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;

  @Column({ name: 'accepted_at', type: 'timestamptz', nullable: true })
  acceptedAt: Date | null;

  @Column({ name: 'accepted_by', type: 'uuid', nullable: true })
  acceptedBy: string | null;
}
