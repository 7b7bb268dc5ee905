import { InjectQueue } from '@nestjs/bull';
import { Inject, Injectable, Logger, OnApplicationBootstrap, OnApplicationShutdown } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { Queue } from 'bull';
import { randomUUID } from 'node:crypto';
import { DataSource, EntityManager } from 'typeorm';
import { ENV, Env } from '../config/env';
import { OutgoingMail } from './entities/outgoing-mail.entity';
import { MAIL_QUEUE, SEND_JOB } from './mail.constants';

export interface MailToSend {
  companyId: string | null;
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; contentType: string; content: Buffer }[];
}

const SWEEP_MS = 30_000;

/**
 * All mail goes out through the queue. A message is first recorded in `outgoing_mail` (inside the
 * caller's transaction, so it exists exactly when the change it reports does), then a job with the
 * row's id as its job id is queued. A sweeper re-queues rows still waiting (say Redis was down when
 * the job was added); bull ignores a job id it already holds, so nothing is sent twice.
 */
@Injectable()
export class MailService implements OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger(MailService.name);
  private sweeper?: NodeJS.Timeout;

  constructor(
    @InjectDataSource() private readonly db: DataSource,
    @InjectQueue(MAIL_QUEUE) private readonly queue: Queue,
    @Inject(ENV) private readonly env: Env,
  ) {}

  /** Records a message in the caller's transaction; call `dispatch` with the id after commit. */
  async record(manager: EntityManager, mail: MailToSend): Promise<string> {
    const repo = manager.getRepository(OutgoingMail);
    const row = await repo.save(
      repo.create({
        companyId: mail.companyId,
        messageId: `<${randomUUID()}@potlife.local>`,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html ?? null,
        attachments: (mail.attachments ?? []).map((a) => ({
          filename: a.filename,
          contentType: a.contentType,
          contentBase64: a.content.toString('base64'),
        })),
      }),
    );
    return row.id;
  }

  /** Queues the job for a recorded message. Never throws: the sweeper retries if Redis is away. */
  async dispatch(id: string): Promise<void> {
    try {
      await this.queue.add(
        SEND_JOB,
        { outgoingMailId: id },
        {
          jobId: id,
          attempts: this.env.MAIL_ATTEMPTS,
          backoff: { type: 'capped' },
          removeOnComplete: 500,
          removeOnFail: 500,
        },
      );
    } catch (err) {
      this.logger.warn(`mail ${id} not queued yet (${String(err)}); the sweeper will retry`);
    }
  }

  /** Record and dispatch in one go, for mail that belongs to no other change. */
  async send(mail: MailToSend): Promise<string> {
    const id = await this.record(this.db.manager, mail);
    await this.dispatch(id);
    return id;
  }

  async sweep(): Promise<number> {
    const rows: { id: string }[] = await this.db.query(
      `SELECT id FROM outgoing_mail WHERE status = 'queued' AND created_at < now() - interval '10 seconds' ORDER BY created_at LIMIT 200`,
    );
    for (const r of rows) {
      const job = await this.queue.getJob(r.id);
      if (!job) {
        await this.dispatch(r.id);
      }
    }
    return rows.length;
  }

  onApplicationBootstrap(): void {
    if (this.env.QUEUE_ROLE === 'api' || this.env.NODE_ENV === 'test') {
      return;
    }
    this.sweeper = setInterval(() => {
      this.sweep().catch((err: unknown) => this.logger.warn(`mail sweep failed: ${String(err)}`));
    }, SWEEP_MS);
    this.sweeper.unref();
  }

  onApplicationShutdown(): void {
    if (this.sweeper) {
      clearInterval(this.sweeper);
    }
  }
}
