import type { MigrationInterface, QueryRunner } from 'typeorm';

// The hardware registry. Lengths in mm (double precision); enumerations as CHECK constraints so that a
// new value is a one-line migration; every table carries created/updated timestamps and a version.
const stamps = `created_at timestamptz NOT NULL DEFAULT now(), updated_at timestamptz NOT NULL DEFAULT now(), version integer NOT NULL`;
const REGION = `CHECK (region IN ('NA','EU','JP','TW','KR','CN','SG','other'))`;

// The site settings the fit rules read, with the pg_trgm extension the search indexes use.
async function addFitSettings(q: QueryRunner): Promise<void> {
  await q.query(`CREATE EXTENSION IF NOT EXISTS pg_trgm`);
  await q.query(`ALTER TABLE site_settings
      ADD COLUMN tip_clearance_min_mm double precision NOT NULL DEFAULT 5 CHECK (tip_clearance_min_mm >= 0),
      ADD COLUMN tip_clearance_max_mm double precision NOT NULL DEFAULT 25,
      ADD COLUMN thread_match_tolerance_mm double precision NOT NULL DEFAULT 0.6 CHECK (thread_match_tolerance_mm >= 0),
      ADD COLUMN laminar_limit double precision NOT NULL DEFAULT 2300 CHECK (laminar_limit > 0),
      ADD COLUMN max_return_velocity_ratio double precision NOT NULL DEFAULT 4 CHECK (max_return_velocity_ratio >= 1),
      ADD CONSTRAINT site_settings_clearance_window CHECK (tip_clearance_max_mm > tip_clearance_min_mm)`);
}

// Suppliers, thread specifications and key codes: what the hardware tables point at.
async function createReferenceTables(q: QueryRunner): Promise<void> {
  await q.query(`CREATE TABLE suppliers (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      name varchar(120) NOT NULL,
      region varchar(8) NOT NULL ${REGION},
      contact_email varchar(254),
      notes varchar(2000),
      ${stamps})`);
  await q.query(`CREATE UNIQUE INDEX suppliers_name_key ON suppliers (lower(name))`);

  await q.query(`CREATE TABLE thread_specs (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      code varchar(40) NOT NULL UNIQUE,
      family varchar(12) NOT NULL CHECK (family IN ('NPS','NPT','G','buttress','other')),
      nominal_label varchar(40) NOT NULL,
      major_diameter_mm double precision NOT NULL CHECK (major_diameter_mm > 0),
      pitch_mm double precision NOT NULL CHECK (pitch_mm > 0),
      threads_per_inch double precision NOT NULL CHECK (threads_per_inch > 0),
      flank_angle_deg double precision NOT NULL CHECK (flank_angle_deg > 0 AND flank_angle_deg < 180),
      form varchar(10) NOT NULL CHECK (form IN ('tapered','parallel')),
      standard varchar(200) NOT NULL,
      ${stamps})`);

  await q.query(`CREATE TABLE key_codes (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      code varchar(40) NOT NULL UNIQUE,
      label varchar(120) NOT NULL,
      marking varchar(200),
      ${stamps})`);
}

// Drum types and their openings.
async function createDrumTables(q: QueryRunner): Promise<void> {
  await q.query(`CREATE TABLE drum_types (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      supplier_id uuid NOT NULL REFERENCES suppliers(id) ON DELETE RESTRICT,
      region varchar(8) NOT NULL ${REGION},
      name varchar(120) NOT NULL,
      part_number varchar(60) NOT NULL,
      nominal_capacity_l double precision NOT NULL CHECK (nominal_capacity_l > 0),
      material varchar(12) NOT NULL CHECK (material IN ('steel','plastic','fibre','aluminium','other')),
      head varchar(6) NOT NULL CHECK (head IN ('tight','open')),
      un_packaging_code varchar(40),
      outside_height_mm double precision NOT NULL CHECK (outside_height_mm > 0),
      inside_depth_mm double precision NOT NULL CHECK (inside_depth_mm > 0),
      outside_diameter_mm double precision NOT NULL CHECK (outside_diameter_mm > 0),
      ${stamps},
      CONSTRAINT drum_types_depth_below_height CHECK (inside_depth_mm < outside_height_mm),
      CONSTRAINT drum_types_part_key UNIQUE (supplier_id, part_number))`);
  await q.query(`CREATE INDEX drum_types_region_idx ON drum_types (region)`);
  await q.query(`CREATE INDEX drum_types_search_idx ON drum_types USING gin ((name || ' ' || part_number) gin_trgm_ops)`);

  await q.query(`CREATE TABLE drum_openings (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      drum_type_id uuid NOT NULL REFERENCES drum_types(id) ON DELETE CASCADE,
      label varchar(40) NOT NULL,
      thread_spec_id uuid NOT NULL REFERENCES thread_specs(id),
      bore_mm double precision NOT NULL CHECK (bore_mm > 0),
      key_code_id uuid REFERENCES key_codes(id),
      position varchar(20) NOT NULL CHECK (position IN ('large','small','center','other')),
      ${stamps},
      CONSTRAINT drum_openings_label_key UNIQUE (drum_type_id, label))`);
  await q.query(`CREATE INDEX drum_openings_thread_idx ON drum_openings (thread_spec_id)`);
}

// Dip tubes and connectors, and the reviewed pairings of the two.
async function createHardwareTables(q: QueryRunner): Promise<void> {
  await q.query(`CREATE TABLE dip_tubes (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      part_number varchar(60) NOT NULL,
      supplier_id uuid NOT NULL REFERENCES suppliers(id) ON DELETE RESTRICT,
      thread_spec_id uuid NOT NULL REFERENCES thread_specs(id),
      length_mm double precision NOT NULL CHECK (length_mm > 0),
      bore_mm double precision NOT NULL CHECK (bore_mm > 0),
      od_mm double precision NOT NULL CHECK (od_mm > 0),
      material varchar(40) NOT NULL,
      key_code_id uuid REFERENCES key_codes(id),
      channels varchar(12) NOT NULL CHECK (channels IN ('feed','feed-return')),
      ${stamps},
      CONSTRAINT dip_tubes_bore_inside_od CHECK (bore_mm < od_mm),
      CONSTRAINT dip_tubes_part_key UNIQUE (supplier_id, part_number))`);
  await q.query(`CREATE INDEX dip_tubes_thread_idx ON dip_tubes (thread_spec_id)`);
  await q.query(`CREATE INDEX dip_tubes_search_idx ON dip_tubes USING gin ((part_number || ' ' || material) gin_trgm_ops)`);

  await q.query(`CREATE TABLE connectors (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      part_number varchar(60) NOT NULL,
      supplier_id uuid NOT NULL REFERENCES suppliers(id) ON DELETE RESTRICT,
      key_code_id uuid REFERENCES key_codes(id),
      feed_bore_mm double precision NOT NULL CHECK (feed_bore_mm > 0),
      feed_nominal varchar(20) NOT NULL,
      return_bore_mm double precision CHECK (return_bore_mm > 0),
      return_nominal varchar(20),
      return_path varchar(12) NOT NULL CHECK (return_path IN ('none','restricted','open')),
      suited_to varchar(12) NOT NULL CHECK (suited_to IN ('two-opening','one-opening','both')),
      wetted_materials varchar(200) NOT NULL,
      ${stamps},
      CONSTRAINT connectors_return_consistent CHECK ((return_path = 'none') = (return_bore_mm IS NULL)),
      CONSTRAINT connectors_part_key UNIQUE (supplier_id, part_number))`);
  await q.query(`CREATE INDEX connectors_search_idx ON connectors USING gin ((part_number || ' ' || wetted_materials) gin_trgm_ops)`);

  await q.query(`CREATE TABLE pairings (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      dip_tube_id uuid NOT NULL REFERENCES dip_tubes(id) ON DELETE RESTRICT,
      connector_id uuid NOT NULL REFERENCES connectors(id) ON DELETE RESTRICT,
      status varchar(10) NOT NULL CHECK (status IN ('draft','approved','retired')),
      author_id uuid NOT NULL REFERENCES users(id),
      approver_id uuid REFERENCES users(id),
      approved_at timestamptz,
      notes varchar(2000),
      ${stamps},
      CONSTRAINT pairings_pair_key UNIQUE (dip_tube_id, connector_id),
      CONSTRAINT pairings_four_eyes CHECK (approver_id IS NULL OR approver_id <> author_id),
      CONSTRAINT pairings_approved_has_approver CHECK (status <> 'approved' OR approver_id IS NOT NULL))`);
  await q.query(`CREATE INDEX pairings_connector_idx ON pairings (connector_id)`);
  await q.query(`CREATE INDEX pairings_status_idx ON pairings (status)`);

  await q.query(`CREATE TABLE pairing_reviews (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      pairing_id uuid NOT NULL REFERENCES pairings(id) ON DELETE CASCADE,
      reviewer_id uuid NOT NULL REFERENCES users(id),
      decision varchar(10) NOT NULL CHECK (decision IN ('approved','rejected','retired')),
      comment varchar(2000) NOT NULL,
      ${stamps})`);
  await q.query(`CREATE INDEX pairing_reviews_pairing_idx ON pairing_reviews (pairing_id, created_at)`);
}

// What the site holds: slurries, dispense stations and their tube sets.
async function createSiteTables(q: QueryRunner): Promise<void> {
  await q.query(`CREATE TABLE slurries (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      name varchar(120) NOT NULL,
      supplier_id uuid NOT NULL REFERENCES suppliers(id) ON DELETE RESTRICT,
      region varchar(8) NOT NULL ${REGION},
      drum_type_id uuid NOT NULL REFERENCES drum_types(id) ON DELETE RESTRICT,
      foams boolean NOT NULL DEFAULT false,
      shear_sensitive boolean NOT NULL DEFAULT false,
      solids_wt_pct double precision NOT NULL CHECK (solids_wt_pct >= 0 AND solids_wt_pct <= 100),
      ${stamps})`);
  await q.query(`CREATE UNIQUE INDEX slurries_name_key ON slurries (supplier_id, lower(name))`);

  await q.query(`CREATE TABLE stations (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      name varchar(120) NOT NULL UNIQUE,
      bay varchar(60) NOT NULL,
      tapping varchar(12) NOT NULL CHECK (tapping IN ('two-opening','one-opening')),
      agitation varchar(12) NOT NULL CHECK (agitation IN ('pump','mechanical')),
      connector_id uuid REFERENCES connectors(id) ON DELETE SET NULL,
      flow_lpm double precision NOT NULL CHECK (flow_lpm > 0),
      ${stamps})`);

  await q.query(`CREATE TABLE tube_sets (
      id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
      station_id uuid NOT NULL REFERENCES stations(id) ON DELETE CASCADE,
      label varchar(40) NOT NULL,
      dip_tube_id uuid NOT NULL REFERENCES dip_tubes(id) ON DELETE RESTRICT,
      state varchar(10) NOT NULL CHECK (state IN ('online','standby','cleaning','ready')),
      last_rinsed_at timestamptz,
      last_rinsed_by_id uuid REFERENCES users(id),
      last_used_at timestamptz,
      ${stamps},
      CONSTRAINT tube_sets_label_key UNIQUE (station_id, label))`);
}

export class CreateRegistry1764615600000 implements MigrationInterface {
  name = 'CreateRegistry1764615600000';

  async up(q: QueryRunner): Promise<void> {
    await addFitSettings(q);
    await createReferenceTables(q);
    await createDrumTables(q);
    await createHardwareTables(q);
    await createSiteTables(q);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const t of ['tube_sets', 'stations', 'slurries', 'pairing_reviews', 'pairings', 'connectors', 'dip_tubes', 'drum_openings', 'drum_types', 'key_codes', 'thread_specs', 'suppliers']) {
      await q.query(`DROP TABLE ${t}`);
    }
    await q.query(`ALTER TABLE site_settings DROP CONSTRAINT site_settings_clearance_window, DROP COLUMN tip_clearance_min_mm, DROP COLUMN tip_clearance_max_mm,
      DROP COLUMN thread_match_tolerance_mm, DROP COLUMN laminar_limit, DROP COLUMN max_return_velocity_ratio`);
  }
}
