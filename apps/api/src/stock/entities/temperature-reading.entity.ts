import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { decimalString } from '../../common/decimal.transformer';

/** A storage temperature at a location, typed in or imported from a data logger's CSV. */
@Entity('temperature_readings')
export class TemperatureReading {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @Column({ name: 'location_id', type: 'uuid' })
  locationId: string;

  @Column({ name: 'taken_at', type: 'timestamptz' })
  takenAt: Date;

  @Column({ name: 'temperature_c', type: 'numeric', precision: 5, scale: 2, transformer: decimalString })
  temperatureC: string;

  @Column({ type: 'varchar', length: 8 })
  source: 'manual' | 'import';

  @Column({ type: 'text', nullable: true })
  note: string | null;

  @Column({ name: 'user_id', type: 'uuid', nullable: true })
  userId: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
