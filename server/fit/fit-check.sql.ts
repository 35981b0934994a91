import type { DrumHead } from '../../shared/packaging-code';
import { POOL_LIMIT, TUBES_IN_WINDOW, TUBES_NEAR_MISS, type PoolRow } from '../../shared/fit/search';

// The statements of the fit check (server/fit/fit-check.service.ts) and the dock snapshot.

export const CANDIDATE_SQL = `
  SELECT p.id AS pairing_id, p.status, t.id AS dip_tube_id, t.part_number AS tube_part, th.code AS thread_code, t.length_mm,
         tk.code AS tube_key, t.channels, t.od_mm AS tube_od_mm, c.id AS connector_id, c.part_number AS head_part, ck.code AS head_key,
         c.feed_bore_mm, c.feed_nominal, c.return_bore_mm, c.return_nominal, c.return_path, c.suited_to
  FROM pairings p
  JOIN dip_tubes t ON t.id = p.dip_tube_id
  JOIN thread_specs th ON th.id = t.thread_spec_id
  LEFT JOIN key_codes tk ON tk.id = t.key_code_id
  JOIN connectors c ON c.id = p.connector_id
  LEFT JOIN key_codes ck ON ck.id = c.key_code_id
  WHERE p.status <> 'retired'`;

/** Approved pairings first, then by part numbers: which candidates make the pool when there are more. */
const POOL_ORDER = `CASE p.status WHEN 'approved' THEN 0 ELSE 1 END, t.part_number, c.part_number`;
const CANDIDATE_ORDER = `CASE status WHEN 'approved' THEN 0 ELSE 1 END, tube_part, head_part`;

/**
 * $1 the drum type, or null for a hand-described drum with depth $2 and thread ids $3; $4 the station's
 * installed head or null. The limits are written into the text (not parameters) so the generic plan is
 * costed for the real sizes: a few dozen index lookups, never a scan of the pairings.
 */
export const SNAPSHOT_SQL = `
  WITH st AS (SELECT * FROM site_settings ORDER BY created_at LIMIT 1),
  d AS (SELECT name, part_number, inside_depth_mm, head FROM drum_types WHERE id = $1::uuid),
  o AS (
    SELECT o.label, o.thread_spec_id, th.code AS thread_code, k.code AS key_code, o.bore_mm
    FROM drum_openings o JOIN thread_specs th ON th.id = o.thread_spec_id LEFT JOIN key_codes k ON k.id = o.key_code_id
    WHERE o.drum_type_id = $1::uuid),
  reach AS (
    SELECT depth - st.tip_clearance_max_mm AS lo, depth - st.tip_clearance_min_mm AS hi
    FROM st, (SELECT coalesce((SELECT inside_depth_mm FROM d), $2::float8) AS depth) depth),
  threads AS (SELECT thread_spec_id AS id FROM o UNION SELECT unnest($3::uuid[])),
  tubes AS (
    SELECT x.id FROM threads, reach, LATERAL (
      (SELECT id FROM dip_tubes WHERE thread_spec_id = threads.id AND length_mm BETWEEN reach.lo AND reach.hi ORDER BY length_mm LIMIT ${TUBES_IN_WINDOW})
      UNION ALL (SELECT id FROM (SELECT id FROM dip_tubes WHERE thread_spec_id = threads.id AND length_mm < reach.lo ORDER BY length_mm DESC LIMIT ${TUBES_NEAR_MISS}) below)
      UNION ALL (SELECT id FROM (SELECT id FROM dip_tubes WHERE thread_spec_id = threads.id AND length_mm > reach.hi ORDER BY length_mm ASC LIMIT ${TUBES_NEAR_MISS}) above)) x),
  pairs AS (
    SELECT p.* FROM tubes, LATERAL (SELECT id, status, dip_tube_id, connector_id FROM pairings WHERE dip_tube_id = tubes.id AND status <> 'retired' OFFSET 0) p),
  by_tube AS (
    SELECT p.id FROM pairs p JOIN dip_tubes t ON t.id = p.dip_tube_id JOIN connectors c ON c.id = p.connector_id
    ORDER BY ${POOL_ORDER} LIMIT ${POOL_LIMIT}),
  by_head AS (
    SELECT p.id FROM pairings p JOIN dip_tubes t ON t.id = p.dip_tube_id JOIN connectors c ON c.id = p.connector_id
    WHERE p.connector_id = $4::uuid AND p.status <> 'retired' AND p.id NOT IN (SELECT id FROM by_tube)
    ORDER BY ${POOL_ORDER} LIMIT ${POOL_LIMIT}),
  pool AS (
    SELECT CASE WHEN x.pairing_id IN (SELECT id FROM by_tube) THEN 0 ELSE 1 END AS part, x.*
    FROM (${CANDIDATE_SQL} AND p.id IN (SELECT id FROM by_tube UNION ALL SELECT id FROM by_head)) x)
  SELECT (SELECT to_jsonb(st) FROM st) AS settings,
         (SELECT to_jsonb(d) FROM d) AS drum,
         (SELECT coalesce(jsonb_agg(o ORDER BY o.label), '[]') FROM o) AS openings,
         (SELECT coalesce(jsonb_agg(to_jsonb(pool) - 'part' ORDER BY part, ${CANDIDATE_ORDER}), '[]') FROM pool) AS candidates`;

export interface SnapshotRow {
  settings: { tip_clearance_min_mm: number; tip_clearance_max_mm: number; thread_match_tolerance_mm: number; laminar_limit: number; max_return_velocity_ratio: number } | null;
  drum: { name: string; part_number: string; inside_depth_mm: number; head: DrumHead } | null;
  openings: Array<{ label: string; thread_spec_id: string; thread_code: string; key_code: string | null; bore_mm: number }>;
  candidates: PoolRow[];
}
