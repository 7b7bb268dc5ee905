/**
 * The project's own SMTP server standing in for suppliers' and customers' inboxes. It keeps every
 * message it receives, with its attachments, in PostgreSQL (`mail_messages`, `mail_attachments`),
 * once per Message-ID, so a resent message is never stored twice. Loopback only.
 *
 *   node dist/mail/smtp-fake.js        (SMTP_PORT, default 2525; DATABASE_URL)
 */
import { simpleParser } from 'mailparser';
import { Pool } from 'pg';
import { SMTPServer } from 'smtp-server';
import { COMPANY_HEADER } from './mail.constants';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export function createSmtpFake(databaseUrl: string): { server: SMTPServer; pool: Pool } {
  const pool = new Pool({ connectionString: databaseUrl, max: 4 });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['AUTH', 'STARTTLS'],
    banner: 'Potlife local mail catcher',
    size: 25 * 1024 * 1024,
    logger: false,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then(async (mail) => {
          const header = mail.headers.get(COMPANY_HEADER.toLowerCase());
          const companyId = typeof header === 'string' && UUID.test(header) ? header : null;
          const to = [mail.to]
            .flat()
            .filter((a) => !!a)
            .map((a) => a!.text)
            .join(', ');
          const client = await pool.connect();
          try {
            await client.query('BEGIN');
            const known = companyId ? await client.query('SELECT 1 FROM companies WHERE id = $1', [companyId]) : { rowCount: 0 };
            const ins = await client.query<{ id: string }>(
              `INSERT INTO mail_messages (company_id, message_id, from_address, to_address, subject, text, html, received_at)
               VALUES ($1, $2, $3, $4, $5, $6, $7, now())
               ON CONFLICT (message_id) DO NOTHING RETURNING id`,
              [
                known.rowCount ? companyId : null,
                mail.messageId ?? `<no-id-${Date.now()}-${Math.random()}@smtp-fake>`,
                mail.from?.text ?? '',
                to,
                mail.subject ?? '',
                mail.text ?? '',
                typeof mail.html === 'string' ? mail.html : null,
              ],
            );
            const id = ins.rows[0]?.id;
            if (id) {
              for (const [index, a] of mail.attachments.entries()) {
                await client.query(
                  `INSERT INTO mail_attachments (message_id, index, filename, content_type, size, content) VALUES ($1, $2, $3, $4, $5, $6)`,
                  [id, index, a.filename ?? `attachment-${index + 1}`, a.contentType, a.size, a.content],
                );
              }
            }
            await client.query('COMMIT');
          } catch (err) {
            await client.query('ROLLBACK').catch(() => undefined);
            throw err;
          } finally {
            client.release();
          }
        })
        .then(() => callback())
        .catch((err: Error) => callback(err));
    },
  });
  return { server, pool };
}

if (require.main === module) {
  const port = Number(process.env.SMTP_PORT ?? 2525);
  const { server, pool } = createSmtpFake(process.env.DATABASE_URL ?? 'postgres://potlife@127.0.0.1:54329/potlife');
  server.listen(port, '127.0.0.1', () => console.log(`SMTP fake listening on 127.0.0.1:${port}`));
  const stop = () => server.close(() => void pool.end().then(() => process.exit(0)));
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}
