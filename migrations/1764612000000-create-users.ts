import type { MigrationInterface, QueryRunner } from 'typeorm';

export class CreateUsers1764612000000 implements MigrationInterface {
  name = 'CreateUsers1764612000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TYPE user_role AS ENUM ('clerk', 'engineer', 'buyer', 'admin')`);
    await q.query(`
      CREATE TABLE users (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        email varchar(254) NOT NULL,
        display_name varchar(120) NOT NULL,
        role user_role NOT NULL,
        password_hash varchar(100) NOT NULL,
        active boolean NOT NULL DEFAULT true,
        must_change_password boolean NOT NULL DEFAULT false,
        length_unit varchar(2) NOT NULL DEFAULT 'mm' CHECK (length_unit IN ('mm', 'in')),
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL,
        CONSTRAINT users_email_lower CHECK (email = lower(email))
      )`);
    await q.query(`CREATE UNIQUE INDEX users_email_key ON users (email)`);
    await q.query(`
      CREATE TABLE site_settings (
        id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
        site_name varchar(120) NOT NULL,
        created_at timestamptz NOT NULL DEFAULT now(),
        updated_at timestamptz NOT NULL DEFAULT now(),
        version integer NOT NULL
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE site_settings`);
    await q.query(`DROP TABLE users`);
    await q.query(`DROP TYPE user_role`);
  }
}
