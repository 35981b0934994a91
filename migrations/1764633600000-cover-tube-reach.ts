import type { MigrationInterface, QueryRunner } from 'typeorm';

// The fit check reads tubes in reach inside one statement, where the planner cannot see the window's
// bounds: with the tube id in the index it reads the window in order from the index alone, instead of
// fetching every tube of the thread in the window and sorting them.
export class CoverTubeReach1764633600000 implements MigrationInterface {
  name = 'CoverTubeReach1764633600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX dip_tubes_thread_length_idx`);
    await q.query(`CREATE INDEX dip_tubes_thread_length_idx ON dip_tubes (thread_spec_id, length_mm) INCLUDE (id)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX dip_tubes_thread_length_idx`);
    await q.query(`CREATE INDEX dip_tubes_thread_length_idx ON dip_tubes (thread_spec_id, length_mm)`);
  }
}
