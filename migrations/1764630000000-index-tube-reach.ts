import type { MigrationInterface, QueryRunner } from 'typeorm';

// The fit check looks for tubes of a drum's threads whose length puts the tip in the clearance window
// (and the nearest ones either side): one index range scan per thread instead of sorting every pairing.
export class IndexTubeReach1764630000000 implements MigrationInterface {
  name = 'IndexTubeReach1764630000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX dip_tubes_thread_idx`);
    await q.query(`CREATE INDEX dip_tubes_thread_length_idx ON dip_tubes (thread_spec_id, length_mm)`);
    await q.query(`CREATE INDEX pairings_tube_idx ON pairings (dip_tube_id) WHERE status <> 'retired'`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX pairings_tube_idx`);
    await q.query(`DROP INDEX dip_tubes_thread_length_idx`);
    await q.query(`CREATE INDEX dip_tubes_thread_idx ON dip_tubes (thread_spec_id)`);
  }
}
