import type { Job } from 'bull';
import type { DataSource } from 'typeorm';
import type { Env } from '../config/env';
import { MailProcessor } from './mail.processor';

describe('MailProcessor.failed', () => {
  const job = { data: { outgoingMailId: 'm-1' }, attemptsMade: 1, opts: { attempts: 3 } } as unknown as Job<{
    outgoingMailId: string;
  }>;
  const env = { SMTP_URL: 'smtp://127.0.0.1:1', MAIL_FROM: 'Potlife <no-reply@potlife.local>' } as Env;

  it('records the error on the outgoing mail', async () => {
    const update = jest.fn().mockResolvedValue(undefined);
    const p = new MailProcessor({ getRepository: () => ({ update }) } as unknown as DataSource, env);
    await p.failed(job, new Error('connection refused'));
    expect(update).toHaveBeenCalledWith('m-1', { lastError: 'connection refused' });
    p.onModuleDestroy();
  });

  it('never rejects, even when the database is gone (nothing awaits an event handler)', async () => {
    const update = jest.fn().mockRejectedValue(new Error('Connection terminated'));
    const p = new MailProcessor({ getRepository: () => ({ update }) } as unknown as DataSource, env);
    await expect(p.failed(job, new Error('connection refused'))).resolves.toBeUndefined();
    p.onModuleDestroy();
  });
});
