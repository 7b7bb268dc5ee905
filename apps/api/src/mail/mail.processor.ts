import { OnQueueFailed, Process, Processor } from '@nestjs/bull';
import { Inject, Logger, OnModuleDestroy } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Job } from 'bull';
import nodemailer, { Transporter } from 'nodemailer';
import { DataSource } from 'typeorm';
import { ENV, Env } from '../config/env';
import { OutgoingMail } from './entities/outgoing-mail.entity';
import { COMPANY_HEADER, MAIL_QUEUE, SEND_JOB } from './mail.constants';

/** Sends queued mail over SMTP. Runs in the API process (QUEUE_ROLE=all) or a worker process. */
@Processor(MAIL_QUEUE)
export class MailProcessor implements OnModuleDestroy {
  private readonly logger = new Logger(MailProcessor.name);
  private readonly transport: Transporter;

  constructor(
    @InjectDataSource() private readonly db: DataSource,
    @Inject(ENV) private readonly env: Env,
  ) {
    this.transport = nodemailer.createTransport(env.SMTP_URL, {
      connectionTimeout: 5000,
      greetingTimeout: 5000,
      socketTimeout: 15000,
    } as never);
  }

  @Process({ name: SEND_JOB, concurrency: 2 })
  async send(job: Job<{ outgoingMailId: string }>): Promise<void> {
    const repo = this.db.getRepository(OutgoingMail);
    const mail = await repo.findOneBy({ id: job.data.outgoingMailId });
    if (!mail || mail.status === 'sent') {
      return;
    }
    await repo.update(mail.id, { attempts: () => 'attempts + 1' } as never);
    await this.transport.sendMail({
      from: this.env.MAIL_FROM,
      to: mail.to,
      subject: mail.subject,
      text: mail.text,
      html: mail.html ?? undefined,
      messageId: mail.messageId,
      headers: mail.companyId ? { [COMPANY_HEADER]: mail.companyId } : {},
      attachments: mail.attachments.map((a) => ({
        filename: a.filename,
        contentType: a.contentType,
        content: Buffer.from(a.contentBase64, 'base64'),
      })),
    });
    await repo.update(mail.id, { status: 'sent', sentAt: new Date(), lastError: null });
  }

  @OnQueueFailed()
  async failed(job: Job<{ outgoingMailId: string }>, err: Error): Promise<void> {
    const final = job.attemptsMade >= (job.opts.attempts ?? 1);
    this.logger.warn(`mail ${job.data.outgoingMailId} attempt ${job.attemptsMade} failed: ${err.message}`);
    // An event handler: nothing awaits it, so it must never reject. When the database is away (or
    // closing, as the process shuts down) the error is logged; the next attempt records it again.
    try {
      await this.db
        .getRepository(OutgoingMail)
        .update(job.data.outgoingMailId, {
          lastError: err.message.slice(0, 2000),
          ...(final ? { status: 'failed' } : {}),
        });
    } catch (e) {
      this.logger.warn(`mail ${job.data.outgoingMailId}: the failure could not be recorded: ${String(e)}`);
    }
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
