import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Each person's colour theme (shared/themes.ts); 'system' follows the device. */
export class UserTheme1764662400000 implements MigrationInterface {
  name = 'UserTheme1764662400000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users ADD COLUMN theme varchar(8) NOT NULL DEFAULT 'system'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users DROP COLUMN theme`);
  }
}
