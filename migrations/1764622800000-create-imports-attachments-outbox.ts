import type { MigrationInterface, QueryRunner } from 'typeorm';

// Supplier spec imports, attachments kept in object storage, and the mail outbox.
const stamps = `created_at timestamptz NOT NULL DEFAULT now(), updated_at timestamptz NOT NULL DEFAULT now(), version integer NOT NULL`;

export class CreateImportsAttachmentsOutbox1764622800000 implements MigrationInterface {
  name = 'CreateImportsAttachmentsOutbox1764622800000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE attachments (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      owner_kind varchar(20) NOT NULL CHECK (owner_kind IN ('drum-type','dip-tube','connector','receiving-check','import')),
      owner_id uuid NOT NULL,
      file_name varchar(255) NOT NULL,
      content_type varchar(100) NOT NULL,
      size_bytes integer NOT NULL CHECK (size_bytes > 0),
      storage_key varchar(300) NOT NULL UNIQUE,
      uploaded_by_id uuid NOT NULL REFERENCES users(id),
      ${stamps})`);
    await q.query(`CREATE INDEX attachments_owner_idx ON attachments (owner_kind, owner_id)`);

    await q.query(`CREATE TABLE imports (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      kind varchar(12) NOT NULL CHECK (kind IN ('drum-types','dip-tubes','connectors')),
      file_name varchar(255) NOT NULL,
      dry_run boolean NOT NULL,
      outcome varchar(10) NOT NULL CHECK (outcome IN ('dry-run','committed','refused')),
      encoding varchar(20) NOT NULL,
      delimiter varchar(4) NOT NULL,
      counts jsonb NOT NULL,
      errors jsonb NOT NULL,
      attachment_id uuid REFERENCES attachments(id),
      by_id uuid NOT NULL REFERENCES users(id),
      ${stamps})`);
    await q.query(`CREATE INDEX imports_created_idx ON imports (created_at DESC)`);

    await q.query(`ALTER TABLE users ADD COLUMN mail_off varchar(20)[] NOT NULL DEFAULT '{}'`);

    await q.query(`CREATE TABLE outbox (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      kind varchar(20) NOT NULL,
      to_user_id uuid REFERENCES users(id) ON DELETE SET NULL,
      to_email varchar(254) NOT NULL,
      subject varchar(300) NOT NULL,
      text_body text NOT NULL,
      html_body text NOT NULL,
      status varchar(8) NOT NULL DEFAULT 'pending' CHECK (status IN ('pending','sent')),
      attempts integer NOT NULL DEFAULT 0,
      last_error varchar(1000),
      next_attempt_at timestamptz NOT NULL DEFAULT now(),
      sent_at timestamptz,
      ${stamps})`);
    await q.query(`CREATE INDEX outbox_pending_idx ON outbox (next_attempt_at) WHERE status = 'pending'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE outbox`);
    await q.query(`ALTER TABLE users DROP COLUMN mail_off`);
    await q.query(`DROP TABLE imports`);
    await q.query(`DROP TABLE attachments`);
  }
}
