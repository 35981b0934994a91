// The bench's registry: a large invented one, generated in SQL (suppliers, parts, pairings, stations).
import type { Client } from 'pg';
import { THREAD_TABLE } from '../shared/threads/thread-table';
import { hashPassword } from '../server/auth/passwords';
import { log, SIZES } from './bench-lib';

/** 1. A large invented registry, generated in SQL. */
export async function loadRegistry(db: Client): Promise<void> {
  const t0 = Date.now();
  await db.query('BEGIN');
  for (const row of THREAD_TABLE) {
    await db.query(
      `INSERT INTO thread_specs (code, family, nominal_label, major_diameter_mm, pitch_mm, threads_per_inch, flank_angle_deg, form, standard, version) VALUES ($1,$2,$3,$4,$5,$6,$7,$8,$9,1) ON CONFLICT (code) DO NOTHING`,
      [row.code, row.family, row.nominalLabel, row.majorDiameterMm, row.pitchMm, row.threadsPerInch, row.flankAngleDeg, row.form, row.standard],
    );
  }
  const hash = await hashPassword('bench-password-1');
  await db.query(
    `INSERT INTO users (email, display_name, role, password_hash, version) VALUES ('bench.engineer@bungwise.example','Bench Engineer','engineer',$1,1), ('bench.reviewer@bungwise.example','Bench Reviewer','engineer',$1,1), ('bench.clerk@bungwise.example','Bench Clerk','clerk',$1,1)`,
    [hash],
  );
  await db.query(`INSERT INTO site_settings (site_name, version) VALUES ('Bench site', 1)`);
  await db.query(`INSERT INTO key_codes (code, label, version) SELECT 'BK-' || g, 'Bench key ' || g, 1 FROM generate_series(1, 6) g`);
  const regions = `(ARRAY['NA','EU','JP','TW','KR','CN','SG','other'])[1 + g % 8]`;
  await db.query(`INSERT INTO suppliers (name, region, version) SELECT 'Bench Supplier ' || lpad(g::text, 3, '0'), ${regions}, 1 FROM generate_series(1, ${SIZES.suppliers}) g`);
  await db.query(`CREATE TEMP TABLE s AS SELECT id, row_number() OVER (ORDER BY name) AS n FROM suppliers`);
  await db.query(`CREATE TEMP TABLE th AS SELECT id, row_number() OVER (ORDER BY code) AS n FROM thread_specs`);
  await db.query(`CREATE TEMP TABLE k AS SELECT id, row_number() OVER (ORDER BY code) AS n FROM key_codes`);
  const nThreads = THREAD_TABLE.length;
  await db.query(`INSERT INTO drum_types (supplier_id, region, name, part_number, nominal_capacity_l, material, head, un_packaging_code, outside_height_mm, inside_depth_mm, outside_diameter_mm, version)
    SELECT s.id, ${regions}, 'Bench drum ' || g, 'BD-' || lpad(g::text, 6, '0'), 208, CASE WHEN g % 2 = 0 THEN 'steel' ELSE 'plastic' END, 'tight', CASE WHEN g % 2 = 0 THEN '1A1' ELSE '1H1' END, 880, 800 + g % 80, 585, 1
    FROM generate_series(1, ${SIZES.drumTypes}) g JOIN s ON s.n = 1 + g % ${SIZES.suppliers}`);
  await db.query(`INSERT INTO drum_openings (drum_type_id, label, thread_spec_id, bore_mm, key_code_id, position, version)
    SELECT d.id, o.label, th.id, 50, k.id, o.pos, 1
    FROM (SELECT id, row_number() OVER (ORDER BY part_number) AS n FROM drum_types) d
    CROSS JOIN (VALUES ('large bung', 'large', 0), ('small bung', 'small', 1)) AS o(label, pos, off)
    JOIN th ON th.n = 1 + (d.n * 3 + o.off) % ${nThreads}
    LEFT JOIN k ON k.n = 1 + d.n % 7`);
  await db.query(`INSERT INTO dip_tubes (part_number, supplier_id, thread_spec_id, length_mm, bore_mm, od_mm, material, key_code_id, channels, version)
    SELECT 'BT-' || lpad(g::text, 6, '0'), s.id, th.id, 780 + g % 90, 19, 25.4, (ARRAY['PFA','PVDF','HDPE'])[1 + g % 3], k.id, CASE WHEN g % 5 = 0 THEN 'feed-return' ELSE 'feed' END, 1
    FROM generate_series(1, ${SIZES.tubes}) g JOIN s ON s.n = 1 + g % ${SIZES.suppliers} JOIN th ON th.n = 1 + g % ${nThreads} LEFT JOIN k ON k.n = 1 + g % 7`);
  await db.query(`INSERT INTO connectors (part_number, supplier_id, key_code_id, feed_bore_mm, feed_nominal, return_bore_mm, return_nominal, return_path, suited_to, wetted_materials, version)
    SELECT 'BH-' || lpad(g::text, 6, '0'), s.id, k.id, 19.05, '3/4 in', CASE WHEN g % 3 = 0 THEN NULL ELSE 12.7 + (g % 2) * 6.35 END, CASE WHEN g % 3 = 0 THEN NULL ELSE '1/2 in' END,
      CASE WHEN g % 3 = 0 THEN 'none' ELSE 'open' END, (ARRAY['two-opening','one-opening','both'])[1 + g % 3], 'PFA, PTFE', 1
    FROM generate_series(1, ${SIZES.connectors}) g JOIN s ON s.n = 1 + g % ${SIZES.suppliers} LEFT JOIN k ON k.n = 1 + g % 7`);
  // 100,000 distinct (tube, head) pairs: each tube with up to four heads spread over the catalogue.
  await db.query(`INSERT INTO pairings (dip_tube_id, connector_id, status, author_id, approver_id, approved_at, version)
    SELECT t.id, c.id, CASE WHEN g % 4 = 0 THEN 'draft' ELSE 'approved' END,
      (SELECT id FROM users WHERE email = 'bench.engineer@bungwise.example'),
      CASE WHEN g % 4 = 0 THEN NULL ELSE (SELECT id FROM users WHERE email = 'bench.reviewer@bungwise.example') END,
      CASE WHEN g % 4 = 0 THEN NULL ELSE now() END, 1
    FROM generate_series(0, ${SIZES.pairings - 1}) g
    JOIN (SELECT id, row_number() OVER (ORDER BY part_number) - 1 AS n FROM dip_tubes) t ON t.n = g % ${SIZES.tubes}
    JOIN (SELECT id, row_number() OVER (ORDER BY part_number) - 1 AS n FROM connectors) c ON c.n = ((g % ${SIZES.tubes}) * 13 + (g / ${SIZES.tubes}) * 7477) % ${SIZES.connectors}
    ON CONFLICT DO NOTHING`);

  // Stations for the sourcing figure: each with an installed head and a clean set ready and one online.
  await db.query(`INSERT INTO stations (name, bay, tapping, agitation, connector_id, flow_lpm, version)
    SELECT 'Bench station ' || lpad(g::text, 3, '0'), 'Bay ' || (1 + g % 12), CASE WHEN g % 4 = 0 THEN 'one-opening' ELSE 'two-opening' END, CASE WHEN g % 3 = 0 THEN 'mechanical' ELSE 'pump' END, c.id, 10 + g % 30, 1
    FROM generate_series(1, ${SIZES.stations}) g JOIN (SELECT id, row_number() OVER (ORDER BY part_number) AS n FROM connectors) c ON c.n = 1 + (g * 149) % ${SIZES.connectors}`);
  await db.query(`INSERT INTO tube_sets (station_id, label, dip_tube_id, state, last_rinsed_at, version)
    SELECT st.id, 'Set ' || x.n, t.id, x.state, now() - interval '2 days', 1
    FROM (SELECT id, row_number() OVER (ORDER BY name) AS n FROM stations) st
    CROSS JOIN (VALUES (1, 'online'), (2, 'ready')) AS x(n, state)
    JOIN (SELECT id, row_number() OVER (ORDER BY part_number) AS n FROM dip_tubes) t ON t.n = 1 + (st.n * 211 + x.n) % ${SIZES.tubes}`);
  await db.query('COMMIT');
  // As after any bulk load: statistics and the visibility map (index-only scans), so autovacuum does not start mid-measurement.
  await db.query('VACUUM ANALYZE');
  const counts = (
    await db.query(
      `SELECT (SELECT count(*) FROM drum_types) AS d, (SELECT count(*) FROM dip_tubes) AS t, (SELECT count(*) FROM connectors) AS c, (SELECT count(*) FROM pairings) AS p, (SELECT count(*) FROM suppliers) AS s, (SELECT count(*) FROM stations) AS st`,
    )
  ).rows[0];
  log(
    `registry loaded in ${((Date.now() - t0) / 1000).toFixed(1)} s: ${counts.d} drum types, ${counts.t} tubes, ${counts.c} connectors, ${counts.p} pairings, ${counts.s} suppliers, ${counts.st} stations`,
  );
}
