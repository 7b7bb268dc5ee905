import { Column, Entity, Index, OneToMany, PrimaryGeneratedColumn } from 'typeorm';
import { MailAttachment } from './mail-attachment.entity';

/** A message the local SMTP fake received: it stands in for suppliers' and customers' inboxes. */
@Entity('mail_messages')
export class MailMessage {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Index()
  @Column({ name: 'company_id', type: 'uuid', nullable: true })
  companyId: string | null;

  @Column({ name: 'message_id', type: 'varchar', length: 300, unique: true })
  messageId: string;

  @Column({ name: 'from_address', type: 'text' })
  from: string;

  @Column({ name: 'to_address', type: 'text' })
  to: string;

  @Column({ type: 'text' })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'text', nullable: true })
  html: string | null;

  @Column({ name: 'received_at', type: 'timestamptz' })
  receivedAt: Date;

  @OneToMany(() => MailAttachment, (a) => a.message)
  attachments: MailAttachment[];
}
