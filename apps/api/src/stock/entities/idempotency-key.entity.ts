import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/** The first response to a request sent with an `Idempotency-Key`, answered again to a retry. */
@Entity('idempotency_keys')
export class IdempotencyKeyRecord {
  @PrimaryColumn({ name: 'company_id', type: 'uuid' })
  companyId: string;

  @PrimaryColumn({ type: 'varchar', length: 200 })
  key: string;

  @Column({ type: 'varchar', length: 200 })
  route: string;

  @Column({ name: 'request_hash', type: 'char', length: 64 })
  requestHash: string;

  @Column({ type: 'jsonb', nullable: true })
  response: unknown;

  @Column({ name: 'user_id', type: 'uuid', nullable: true })
  userId: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
