import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export type OutgoingMailStatus = 'queued' | 'sent' | 'failed';

/** A message Potlife has queued for sending; the queue job only carries its id. */
@Entity('outgoing_mail')
export class OutgoingMail {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index()
  @Column({ name: 'company_id', type: 'uuid', nullable: true })
  companyId: string | null;

  @Column({ name: 'message_id', type: 'varchar', length: 200, unique: true })
  messageId: string;

  @Column({ name: 'to_address', type: 'varchar', length: 1000 })
  to: string;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'text', nullable: true })
  html: string | null;

  /** [{filename, contentType, contentBase64}] */
  @Column({ type: 'jsonb', default: () => "'[]'" })
  attachments: { filename: string; contentType: string; contentBase64: string }[];

  @Column({ type: 'varchar', length: 10, default: 'queued' })
  status: OutgoingMailStatus;

  @Column({ type: 'int', default: 0 })
  attempts: number;

  @Column({ name: 'last_error', type: 'text', nullable: true })
  lastError: string | null;

  @Column({ name: 'sent_at', type: 'timestamptz', nullable: true })
  sentAt: Date | null;

  @CreateDateColumn({ name: 'created_at', type: 'timestamptz' })
  createdAt: Date;
}
