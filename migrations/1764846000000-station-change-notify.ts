import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The tables a fit answer about a registered station is read from besides the registry: the station (its tapping,
 * agitation, flow and installed head) and its tube sets (which is ready next, when it was rinsed and used). Their
 * changes notify the registry's channel too, so answers naming a station or a tube set can be kept.
 */
export const STATION_TABLES = ['stations', 'tube_sets'] as const;

export class StationChangeNotify1764846000000 implements MigrationInterface {
  name = 'StationChangeNotify1764846000000';

  async up(q: QueryRunner): Promise<void> {
    for (const table of STATION_TABLES) {
      await q.query(`CREATE TRIGGER ${table}_notify AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON ${table} FOR EACH STATEMENT EXECUTE FUNCTION bungwise_notify_change('bungwise_registry')`);
    }
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of STATION_TABLES) await q.query(`DROP TRIGGER ${table}_notify ON ${table}`);
  }
}
