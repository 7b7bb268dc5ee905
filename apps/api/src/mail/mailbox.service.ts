import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { DataSource } from 'typeorm';
import { MailMessageDetail, MailMessageSummary } from './dto/mail.dto';
import { MailAttachment } from './entities/mail-attachment.entity';
import { MailMessage } from './entities/mail-message.entity';

/** Reads what the local SMTP fake received, for the owner's Mail outbox page. */
@Injectable()
export class MailboxService {
  constructor(@InjectDataSource() private readonly db: DataSource) {}

  async list(companyId: string): Promise<MailMessageSummary[]> {
    const rows: (Omit<MailMessageSummary, 'receivedAt'> & { receivedAt: Date })[] = await this.db.query(
      `SELECT m.id, m.from_address AS "from", m.to_address AS "to", m.subject, m.received_at AS "receivedAt",
              (SELECT count(*)::int FROM mail_attachments a WHERE a.message_id = m.id) AS "attachmentCount"
         FROM mail_messages m WHERE m.company_id = $1 ORDER BY m.received_at DESC LIMIT 2000`,
      [companyId],
    );
    return rows.map((r) => ({ ...r, receivedAt: new Date(r.receivedAt).toISOString() }));
  }

  async get(companyId: string, id: string): Promise<MailMessageDetail> {
    const m = await this.db.getRepository(MailMessage).findOne({ where: { id, companyId }, relations: { attachments: true } });
    if (!m) {
      throw new NotFoundException('Message not found');
    }
    const attachments = [...m.attachments].sort((a, b) => a.index - b.index);
    return {
      id: m.id,
      from: m.from,
      to: m.to,
      subject: m.subject,
      receivedAt: m.receivedAt.toISOString(),
      attachmentCount: attachments.length,
      text: m.text,
      html: m.html,
      attachments: attachments.map((a) => ({ index: a.index, filename: a.filename, contentType: a.contentType, size: a.size })),
    };
  }

  async attachment(companyId: string, id: string, index: number): Promise<MailAttachment> {
    const a = await this.db
      .getRepository(MailAttachment)
      .createQueryBuilder('a')
      .addSelect('a.content')
      .innerJoin('a.message', 'm')
      .where('a.messageId = :id AND a.index = :index AND m.companyId = :companyId', { id, index, companyId })
      .getOne();
    if (!a) {
      throw new NotFoundException('Attachment not found');
    }
    return a;
  }
}
