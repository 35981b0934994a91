import type { MigrationInterface, QueryRunner } from 'typeorm';

/** ISO 7-1 taper pipe threads: R (external taper), Rc (internal taper), Rp (internal parallel). */
export class Iso7ThreadFamilies1764759600000 implements MigrationInterface {
  name = 'Iso7ThreadFamilies1764759600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE thread_specs DROP CONSTRAINT thread_specs_family_check`);
    await q.query(`ALTER TABLE thread_specs ADD CONSTRAINT thread_specs_family_check CHECK (family IN ('NPS','NPT','G','R','Rc','Rp','buttress','other'))`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DELETE FROM thread_specs WHERE family IN ('R','Rc','Rp')`);
    await q.query(`ALTER TABLE thread_specs DROP CONSTRAINT thread_specs_family_check`);
    await q.query(`ALTER TABLE thread_specs ADD CONSTRAINT thread_specs_family_check CHECK (family IN ('NPS','NPT','G','buttress','other'))`);
  }
}
