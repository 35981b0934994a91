import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The channels, and the tables whose changes each announces (server/db/change-feed.ts listens). */
export const CHANGE_CHANNELS = {
  // Every table a fit-check answer to a registry-only question is computed from.
  bungwise_registry: ['site_settings', 'thread_specs', 'key_codes', 'drum_types', 'drum_openings', 'dip_tubes', 'connectors', 'pairings', 'slurries'],
  // Who may sign in, and with which role: kept per process for the token check.
  bungwise_users: ['users'],
} as const;

// A change to any of those tables notifies its channel at commit, so every server process drops what it
// keeps from them. One notice per table per transaction: PostgreSQL folds identical notices, and the
// trigger fires once per statement, never per row.
export class ChangeNotify1764637200000 implements MigrationInterface {
  name = 'ChangeNotify1764637200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE FUNCTION bungwise_notify_change() RETURNS trigger LANGUAGE plpgsql AS $$
      BEGIN
        PERFORM pg_notify(TG_ARGV[0], TG_TABLE_NAME);
        RETURN NULL;
      END $$`);
    for (const [channel, tables] of Object.entries(CHANGE_CHANNELS)) {
      for (const table of tables) {
        await q.query(`CREATE TRIGGER ${table}_notify AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON ${table} FOR EACH STATEMENT EXECUTE FUNCTION bungwise_notify_change('${channel}')`);
      }
    }
  }

  async down(q: QueryRunner): Promise<void> {
    for (const tables of Object.values(CHANGE_CHANNELS)) for (const table of tables) await q.query(`DROP TRIGGER ${table}_notify ON ${table}`);
    await q.query(`DROP FUNCTION bungwise_notify_change()`);
  }
}
