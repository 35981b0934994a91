import type { MigrationInterface, QueryRunner } from 'typeorm';

// An append-only record of every registry change and approval. The API has no route that edits it, and
// the table refuses UPDATE and DELETE outright, so not even a bug in the server can rewrite history.
export class CreateAuditLog1764626400000 implements MigrationInterface {
  name = 'CreateAuditLog1764626400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE audit_log (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      at timestamptz NOT NULL DEFAULT now(),
      user_id uuid REFERENCES users(id),
      action varchar(20) NOT NULL,
      entity varchar(30) NOT NULL,
      entity_id uuid,
      summary varchar(500) NOT NULL,
      before jsonb,
      after jsonb,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      version integer NOT NULL DEFAULT 1)`);
    await q.query(`CREATE INDEX audit_log_at_idx ON audit_log (at DESC)`);
    await q.query(`CREATE INDEX audit_log_entity_idx ON audit_log (entity, entity_id, at DESC)`);
    await q.query(`CREATE FUNCTION audit_log_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN RAISE EXCEPTION 'audit_log is append-only'; END $$`);
    await q.query(`CREATE TRIGGER audit_log_no_update BEFORE UPDATE OR DELETE ON audit_log FOR EACH ROW EXECUTE FUNCTION audit_log_append_only()`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE audit_log`);
    await q.query(`DROP FUNCTION audit_log_append_only()`);
  }
}
