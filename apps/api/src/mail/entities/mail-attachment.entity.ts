import { Column, Entity, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { MailMessage } from './mail-message.entity';

@Entity('mail_attachments')
export class MailAttachment {
  @PrimaryColumn({ name: 'message_id', type: 'uuid' })
  messageId: string;

  @PrimaryColumn({ type: 'int' })
  index: number;

  @ManyToOne(() => MailMessage, (m) => m.attachments, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'message_id' })
  message: MailMessage;

  @Column({ type: 'text' })
  filename: string;

  @Column({ name: 'content_type', type: 'varchar', length: 200 })
  contentType: string;

  @Column({ type: 'int' })
  size: number;

  @Column({ type: 'bytea', select: false })
  content: Buffer;
}
