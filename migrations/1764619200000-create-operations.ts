import type { MigrationInterface, QueryRunner } from 'typeorm';

// What happens at the dock, at the stations and in purchasing: receiving checks and holds, in-app
// notices, sourcing plans and the hardware warnings they raise, tube-set rinses and change-outs.
const stamps = `created_at timestamptz NOT NULL DEFAULT now(), updated_at timestamptz NOT NULL DEFAULT now(), version integer NOT NULL`;

export class CreateOperations1764619200000 implements MigrationInterface {
  name = 'CreateOperations1764619200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE receiving_checks (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      lot_number varchar(60) NOT NULL,
      supplier_id uuid REFERENCES suppliers(id),
      slurry_id uuid REFERENCES slurries(id),
      drum_count integer NOT NULL CHECK (drum_count > 0 AND drum_count <= 1000),
      drum_type_id uuid REFERENCES drum_types(id),
      drum_description jsonb,
      station_id uuid REFERENCES stations(id),
      verdict varchar(8) NOT NULL CHECK (verdict IN ('fits','caution','no-fit')),
      result jsonb NOT NULL,
      checked_by_id uuid NOT NULL REFERENCES users(id),
      status varchar(10) NOT NULL DEFAULT 'checked' CHECK (status IN ('checked','on-hold','released')),
      hold_reason varchar(2000),
      held_by_id uuid REFERENCES users(id),
      held_at timestamptz,
      released_by_id uuid REFERENCES users(id),
      released_at timestamptz,
      release_comment varchar(2000),
      ${stamps},
      CONSTRAINT receiving_checks_drum_given CHECK ((drum_type_id IS NULL) <> (drum_description IS NULL)),
      CONSTRAINT receiving_checks_hold_reason CHECK (status <> 'on-hold' OR hold_reason IS NOT NULL))`);
    await q.query(`CREATE INDEX receiving_checks_created_idx ON receiving_checks (created_at DESC)`);
    await q.query(`CREATE INDEX receiving_checks_lot_idx ON receiving_checks (lot_number)`);

    await q.query(`CREATE TABLE notifications (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      user_id uuid NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      kind varchar(20) NOT NULL CHECK (kind IN ('lot-held','hardware-gap','pairing-review','pairing-decision')),
      title varchar(200) NOT NULL,
      body varchar(4000) NOT NULL,
      link varchar(300),
      read_at timestamptz,
      ${stamps})`);
    await q.query(`CREATE INDEX notifications_user_idx ON notifications (user_id, created_at DESC)`);

    await q.query(`CREATE TABLE sourcing_plans (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      slurry_name varchar(120) NOT NULL,
      supplier_id uuid NOT NULL REFERENCES suppliers(id),
      drum_type_id uuid NOT NULL REFERENCES drum_types(id),
      start_date date NOT NULL,
      drums_per_month integer NOT NULL CHECK (drums_per_month > 0 AND drums_per_month <= 10000),
      station_ids uuid[] NOT NULL,
      foams boolean NOT NULL DEFAULT false,
      shear_sensitive boolean NOT NULL DEFAULT false,
      notes varchar(2000),
      created_by_id uuid NOT NULL REFERENCES users(id),
      ${stamps},
      CONSTRAINT sourcing_plans_stations CHECK (cardinality(station_ids) > 0))`);

    await q.query(`CREATE TABLE hardware_warnings (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      source varchar(6) NOT NULL CHECK (source IN ('plan','lot')),
      sourcing_plan_id uuid REFERENCES sourcing_plans(id) ON DELETE CASCADE,
      receiving_check_id uuid REFERENCES receiving_checks(id) ON DELETE CASCADE,
      status varchar(14) NOT NULL DEFAULT 'open' CHECK (status IN ('open','acknowledged','resolved')),
      summary varchar(1000) NOT NULL,
      needs jsonb NOT NULL,
      acknowledged_by_id uuid REFERENCES users(id),
      acknowledged_at timestamptz,
      resolved_by_id uuid REFERENCES users(id),
      resolved_at timestamptz,
      ${stamps},
      CONSTRAINT hardware_warnings_one_source CHECK ((sourcing_plan_id IS NULL) <> (receiving_check_id IS NULL)))`);
    await q.query(`CREATE INDEX hardware_warnings_status_idx ON hardware_warnings (status, created_at DESC)`);

    await q.query(`ALTER TABLE tube_sets
      ADD COLUMN current_lot_number varchar(60),
      ADD COLUMN current_drum_serial varchar(60),
      ADD COLUMN current_receiving_check_id uuid REFERENCES receiving_checks(id)`);

    await q.query(`CREATE TABLE rinse_log (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      tube_set_id uuid NOT NULL REFERENCES tube_sets(id) ON DELETE CASCADE,
      rinsed_by_id uuid NOT NULL REFERENCES users(id),
      rinsed_at timestamptz NOT NULL,
      note varchar(500),
      ${stamps})`);
    await q.query(`CREATE INDEX rinse_log_set_idx ON rinse_log (tube_set_id, rinsed_at DESC)`);

    await q.query(`CREATE TABLE change_outs (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      station_id uuid NOT NULL REFERENCES stations(id) ON DELETE CASCADE,
      tube_set_id uuid NOT NULL REFERENCES tube_sets(id),
      dip_tube_id uuid NOT NULL REFERENCES dip_tubes(id),
      connector_id uuid REFERENCES connectors(id),
      receiving_check_id uuid REFERENCES receiving_checks(id),
      lot_number varchar(60),
      drum_serial varchar(60),
      retired_tube_set_id uuid REFERENCES tube_sets(id),
      by_id uuid NOT NULL REFERENCES users(id),
      at timestamptz NOT NULL,
      ${stamps})`);
    await q.query(`CREATE INDEX change_outs_station_idx ON change_outs (station_id, at)`);
    await q.query(`CREATE INDEX change_outs_check_idx ON change_outs (receiving_check_id)`);
    await q.query(`CREATE INDEX change_outs_lot_idx ON change_outs (lot_number)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE change_outs`);
    await q.query(`DROP TABLE rinse_log`);
    await q.query(`ALTER TABLE tube_sets DROP COLUMN current_receiving_check_id, DROP COLUMN current_drum_serial, DROP COLUMN current_lot_number`);
    await q.query(`DROP TABLE hardware_warnings`);
    await q.query(`DROP TABLE sourcing_plans`);
    await q.query(`DROP TABLE notifications`);
    await q.query(`DROP TABLE receiving_checks`);
  }
}
