import type { MigrationInterface, QueryRunner } from 'typeorm';

// Password changes and resets. `session_epoch` is copied into every sign-in token and compared with the row on
// each request, so bumping it ends every session signed before (the users trigger of 1764637200000 tells each
// process to drop the row it kept). A reset link is kept only as the SHA-256 of its token.
export class PasswordResets1764644400000 implements MigrationInterface {
  name = 'PasswordResets1764644400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users ADD COLUMN session_epoch integer NOT NULL DEFAULT 0, ADD COLUMN password_changed_at timestamptz`);
    await q.query(`CREATE TABLE password_resets (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      token_hash char(64) NOT NULL UNIQUE,
      expires_at timestamptz NOT NULL,
      used_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1)`);
    await q.query(`CREATE INDEX password_resets_open_idx ON password_resets (user_id) WHERE used_at IS NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE password_resets`);
    await q.query(`ALTER TABLE users DROP COLUMN password_changed_at, DROP COLUMN session_epoch`);
  }
}
