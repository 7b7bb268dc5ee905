import { Client } from 'pg';
import { MailService } from '../src/mail/mail.service';
import { createSmtpFake } from '../src/mail/smtp-fake';
import { auth, createTestApp, registerCompany, TestApp } from './app';

const until = async (check: () => Promise<boolean>, ms: number) => {
  const end = Date.now() + ms;
  while (Date.now() < end) {
    if (await check()) {
      return true;
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  return false;
};

describe('mail goes through the queue and survives the SMTP server being down', () => {
  const port = 26000 + Math.floor(Math.random() * 2000);
  let t: TestApp;
  let db: Client;
  beforeAll(async () => {
    t = await createTestApp({ SMTP_URL: `smtp://127.0.0.1:${port}`, MAIL_RETRY_BASE_MS: '150', MAIL_ATTEMPTS: '40' });
    db = new Client({ connectionString: t.databaseUrl });
    await db.connect();
  });
  afterAll(async () => {
    await db.end();
    await t.close();
  });

  const received = async (messageId: string) =>
    (await db.query(`SELECT count(*)::int AS n FROM mail_messages WHERE message_id = $1`, [messageId])).rows[0].n as number;

  it('waits while the SMTP fake is down, delivers once it is back, and never twice', async () => {
    const owner = await registerCompany(t);
    const mail = t.app.get(MailService);
    const id = await mail.send({
      companyId: owner.user.companyId,
      to: 'orders@supplier.test',
      subject: 'Purchase order 0001',
      text: 'Please supply the attached order.',
      attachments: [{ filename: 'order-0001.csv', contentType: 'text/csv', content: Buffer.from('material,packs\nresin 25 kg,4\n') }],
    });
    const row = async () => (await db.query(`SELECT status, attempts, last_error, message_id FROM outgoing_mail WHERE id = $1`, [id])).rows[0];

    // Nothing listens yet: attempts fail and the message stays queued.
    expect(await until(async () => (await row()).attempts >= 2, 10_000)).toBe(true);
    expect((await row()).status).toBe('queued');
    expect((await row()).last_error).toMatch(/ECONNREFUSED|connect/i);
    const messageId = (await row()).message_id as string;
    expect(await received(messageId)).toBe(0);

    const fake = createSmtpFake(t.databaseUrl);
    await new Promise<void>((r) => fake.server.listen(port, '127.0.0.1', r));
    try {
      expect(await until(async () => (await row()).status === 'sent', 20_000)).toBe(true);
      expect(await received(messageId)).toBe(1);

      // A second dispatch of the same message (a retried request, a sweeper pass) sends nothing more.
      await mail.dispatch(id);
      await new Promise((r) => setTimeout(r, 1000));
      expect(await received(messageId)).toBe(1);

      // The owner's outbox shows it, with its attachment.
      const list = await t.http().get('/api/mail/messages').set(auth(owner)).expect(200);
      expect(list.body).toHaveLength(1);
      expect(list.body[0]).toMatchObject({ subject: 'Purchase order 0001', to: 'orders@supplier.test', attachmentCount: 1 });
      const detail = await t.http().get(`/api/mail/messages/${list.body[0].id}`).set(auth(owner)).expect(200);
      expect(detail.body.text).toContain('Please supply the attached order.');
      expect(detail.body.attachments).toEqual([{ index: 0, filename: 'order-0001.csv', contentType: 'text/csv', size: 29 }]);
      const file = await t.http().get(`/api/mail/messages/${list.body[0].id}/attachments/0`).set(auth(owner)).expect(200);
      expect(file.text ?? file.body.toString()).toContain('resin 25 kg,4');
    } finally {
      await new Promise<void>((r) => fake.server.close(() => r()));
      await fake.pool.end();
    }
  });

  it('the SMTP fake keeps a message once per Message-ID', async () => {
    const fake = createSmtpFake(t.databaseUrl);
    const p2 = port + 1;
    await new Promise<void>((r) => fake.server.listen(p2, '127.0.0.1', r));
    const nodemailer = await import('nodemailer');
    const tx = nodemailer.createTransport(`smtp://127.0.0.1:${p2}`);
    try {
      const msg = { from: 'a@test', to: 'b@test', subject: 'twice', text: 'same', messageId: '<same-id@test>' };
      await tx.sendMail(msg);
      await tx.sendMail(msg);
      expect(await received('<same-id@test>')).toBe(1);
    } finally {
      tx.close();
      await new Promise<void>((r) => fake.server.close(() => r()));
      await fake.pool.end();
    }
  });
});
