import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Dock checks made on a phone with no network: the phone's key for the check (a replay of the same key
 * records nothing new), what the phone decided (compared with the server's), and the notice kind that
 * reports a difference.
 */
export class OfflineDockChecks1764666000000 implements MigrationInterface {
  name = 'OfflineDockChecks1764666000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE receiving_checks ADD COLUMN client_key uuid, ADD COLUMN provisional jsonb`);
    await q.query(`CREATE UNIQUE INDEX receiving_checks_client_key ON receiving_checks (client_key) WHERE client_key IS NOT NULL`);
    await q.query(`ALTER TABLE notifications DROP CONSTRAINT notifications_kind_check`);
    await q.query(`ALTER TABLE notifications ADD CONSTRAINT notifications_kind_check CHECK (kind IN ('lot-held','hardware-gap','pairing-review','pairing-decision','verdict-differs'))`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DELETE FROM notifications WHERE kind = 'verdict-differs'`);
    await q.query(`ALTER TABLE notifications DROP CONSTRAINT notifications_kind_check`);
    await q.query(`ALTER TABLE notifications ADD CONSTRAINT notifications_kind_check CHECK (kind IN ('lot-held','hardware-gap','pairing-review','pairing-decision'))`);
    await q.query(`DROP INDEX receiving_checks_client_key`);
    await q.query(`ALTER TABLE receiving_checks DROP COLUMN client_key, DROP COLUMN provisional`);
  }
}
