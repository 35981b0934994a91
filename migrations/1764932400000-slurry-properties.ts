import type { MigrationInterface, QueryRunner } from 'typeorm';

// A slurry's own properties (flow, recirculation, chemistry), the drum's inside diameter (heel and run time) and a
// station's transfer line (pressure drop). Every column is optional: a record without it leaves the computations
// that need it "not checked". The bounds are those of shared/records (slurry.ts, drum-type.ts, station.ts).
const SLURRY_COLUMNS = [
  'density_kg_m3 double precision CHECK (density_kg_m3 BETWEEN 500 AND 5000)',
  "viscosity_model text CHECK (viscosity_model IN ('newtonian','power-law'))",
  'viscosity_mpa_s double precision CHECK (viscosity_mpa_s > 0 AND viscosity_mpa_s <= 100000)',
  'consistency_pa_sn double precision CHECK (consistency_pa_sn > 0 AND consistency_pa_sn <= 1000)',
  'flow_index double precision CHECK (flow_index > 0 AND flow_index <= 2)',
  'particle_size_nm double precision CHECK (particle_size_nm > 0 AND particle_size_nm <= 100000)',
  'min_velocity_m_s double precision CHECK (min_velocity_m_s >= 0 AND min_velocity_m_s <= 20)',
  'max_velocity_m_s double precision CHECK (max_velocity_m_s > 0 AND max_velocity_m_s <= 20)',
  'max_wall_shear_per_s double precision CHECK (max_wall_shear_per_s > 0 AND max_wall_shear_per_s <= 1000000)',
  'min_turnovers double precision CHECK (min_turnovers >= 0 AND min_turnovers <= 100)',
  'min_recirc_minutes double precision CHECK (min_recirc_minutes >= 0 AND min_recirc_minutes <= 1440)',
  'ph_min double precision CHECK (ph_min BETWEEN 0 AND 14)',
  'ph_max double precision CHECK (ph_max BETWEEN 0 AND 14)',
  "oxidiser text CHECK (oxidiser IN ('none','mild','strong'))",
  'solvent_wt_pct double precision CHECK (solvent_wt_pct BETWEEN 0 AND 100)',
];

const SLURRY_RULES = [
  "slurries_viscosity_given CHECK (viscosity_model IS NULL OR (viscosity_model = 'newtonian' AND viscosity_mpa_s IS NOT NULL) OR (viscosity_model = 'power-law' AND consistency_pa_sn IS NOT NULL AND flow_index IS NOT NULL))",
  'slurries_velocity_window CHECK (min_velocity_m_s IS NULL OR max_velocity_m_s IS NULL OR min_velocity_m_s < max_velocity_m_s)',
  'slurries_ph_range CHECK (ph_min IS NULL OR ph_max IS NULL OR ph_min <= ph_max)',
];

const STATION_COLUMNS = [
  'line_length_m double precision CHECK (line_length_m > 0 AND line_length_m <= 1000)',
  'line_bore_mm double precision CHECK (line_bore_mm > 0 AND line_bore_mm <= 200)',
  'line_roughness_um double precision CHECK (line_roughness_um >= 0 AND line_roughness_um <= 5000)',
];

export class SlurryProperties1764932400000 implements MigrationInterface {
  name = 'SlurryProperties1764932400000';

  async up(q: QueryRunner): Promise<void> {
    for (const c of SLURRY_COLUMNS) await q.query(`ALTER TABLE slurries ADD COLUMN ${c}`);
    for (const r of SLURRY_RULES) await q.query(`ALTER TABLE slurries ADD CONSTRAINT ${r}`);
    await q.query(`ALTER TABLE drum_types ADD COLUMN inside_diameter_mm double precision CHECK (inside_diameter_mm > 0)`);
    await q.query(`ALTER TABLE drum_types ADD CONSTRAINT drum_types_inside_diameter CHECK (inside_diameter_mm IS NULL OR inside_diameter_mm < outside_diameter_mm)`);
    for (const c of STATION_COLUMNS) await q.query(`ALTER TABLE stations ADD COLUMN ${c}`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const c of STATION_COLUMNS) await q.query(`ALTER TABLE stations DROP COLUMN ${c.split(' ')[0]}`);
    await q.query(`ALTER TABLE drum_types DROP COLUMN inside_diameter_mm`);
    for (const r of SLURRY_RULES) await q.query(`ALTER TABLE slurries DROP CONSTRAINT ${r.split(' ')[0]}`);
    for (const c of SLURRY_COLUMNS) await q.query(`ALTER TABLE slurries DROP COLUMN ${c.split(' ')[0]}`);
  }
}
