import { MigrationInterface, QueryRunner } from 'typeorm';

/** Companies, users, and mail (queued outgoing mail and the SMTP fake's received messages). */
export class Foundation1764600000000 implements MigrationInterface {
  name = 'Foundation1764600000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE companies (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        name varchar(120) NOT NULL,
        email varchar(320),
        phone varchar(40),
        address text,
        vat_number varchar(20),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid NOT NULL REFERENCES companies(id) ON DELETE CASCADE,
        email varchar(320) NOT NULL,
        name varchar(120) NOT NULL,
        role varchar(20) NOT NULL CHECK (role IN ('owner', 'estimator', 'storeman')),
        password_hash varchar(255),
        active boolean NOT NULL DEFAULT true,
        invitation_token_hash varchar(64),
        invitation_expires_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE UNIQUE INDEX users_email_key ON users (lower(email))`);
    await q.query(`CREATE INDEX users_company_id_idx ON users (company_id)`);
    await q.query(`CREATE UNIQUE INDEX users_invitation_token_key ON users (invitation_token_hash) WHERE invitation_token_hash IS NOT NULL`);
    await q.query(`
      CREATE TABLE outgoing_mail (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid REFERENCES companies(id) ON DELETE CASCADE,
        message_id varchar(200) NOT NULL UNIQUE,
        to_address varchar(1000) NOT NULL,
        subject varchar(300) NOT NULL,
        text text NOT NULL,
        html text,
        attachments jsonb NOT NULL DEFAULT '[]',
        status varchar(10) NOT NULL DEFAULT 'queued' CHECK (status IN ('queued', 'sent', 'failed')),
        attempts int NOT NULL DEFAULT 0,
        last_error text,
        sent_at timestamptz,
        created_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX outgoing_mail_company_id_idx ON outgoing_mail (company_id)`);
    await q.query(`
      CREATE TABLE mail_messages (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        company_id uuid REFERENCES companies(id) ON DELETE CASCADE,
        message_id varchar(300) NOT NULL UNIQUE,
        from_address text NOT NULL,
        to_address text NOT NULL,
        subject text NOT NULL,
        text text NOT NULL,
        html text,
        received_at timestamptz NOT NULL DEFAULT now()
      )`);
    await q.query(`CREATE INDEX mail_messages_company_id_idx ON mail_messages (company_id, received_at DESC)`);
    await q.query(`
      CREATE TABLE mail_attachments (
        message_id uuid NOT NULL REFERENCES mail_messages(id) ON DELETE CASCADE,
        index int NOT NULL,
        filename text NOT NULL,
        content_type varchar(200) NOT NULL,
        size int NOT NULL,
        content bytea NOT NULL,
        PRIMARY KEY (message_id, index)
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE mail_attachments`);
    await q.query(`DROP TABLE mail_messages`);
    await q.query(`DROP TABLE outgoing_mail`);
    await q.query(`DROP TABLE users`);
    await q.query(`DROP TABLE companies`);
  }
}
