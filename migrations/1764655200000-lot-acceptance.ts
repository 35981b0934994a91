import type { MigrationInterface, QueryRunner } from 'typeorm';

// Lot acceptance beside hardware fit: what the clerk records about the lot (dates, temperature indicator),
// what each slurry needs on arrival, the certificate mark on attachments, the quarantined status, the
// site's time zone (whose date "today" is), and the combined decision stored with each check.
export class LotAcceptance1764655200000 implements MigrationInterface {
  name = 'LotAcceptance1764655200000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE slurries
      ADD COLUMN shelf_life_days integer CHECK (shelf_life_days > 0 AND shelf_life_days <= 3650),
      ADD COLUMN min_remaining_days integer CHECK (min_remaining_days >= 0 AND min_remaining_days <= 3650),
      ADD COLUMN storage_min_c real CHECK (storage_min_c >= -50 AND storage_min_c <= 80),
      ADD COLUMN storage_max_c real CHECK (storage_max_c >= -50 AND storage_max_c <= 80),
      ADD COLUMN certificate_required boolean NOT NULL DEFAULT false,
      ADD CONSTRAINT slurries_remaining_within_life CHECK (min_remaining_days IS NULL OR shelf_life_days IS NULL OR min_remaining_days <= shelf_life_days),
      ADD CONSTRAINT slurries_storage_range CHECK (storage_min_c IS NULL OR storage_max_c IS NULL OR storage_min_c < storage_max_c)`);

    await q.query(`ALTER TABLE attachments ADD COLUMN purpose varchar(12) NOT NULL DEFAULT 'file' CHECK (purpose IN ('file','certificate'))`);

    // An existing site keeps the zone of the server that runs this migration; engineers can change it.
    const zone = Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
    await q.query(`ALTER TABLE site_settings ADD COLUMN time_zone varchar(64) NOT NULL DEFAULT 'UTC'`);
    await q.query(`UPDATE site_settings SET time_zone = $1`, [zone]);

    await q.query(`ALTER TABLE receiving_checks
      DROP CONSTRAINT receiving_checks_status_check,
      DROP CONSTRAINT receiving_checks_hold_reason,
      ALTER COLUMN status TYPE varchar(12),
      ADD COLUMN production_date date,
      ADD COLUMN expiry_date date,
      ADD COLUMN temperature_indicator varchar(12) CHECK (temperature_indicator IN ('not-fitted','intact','tripped','froze')),
      ADD COLUMN decision varchar(10) NOT NULL DEFAULT 'accept' CHECK (decision IN ('accept','caution','hold','quarantine')),
      ADD COLUMN acceptance jsonb,
      ADD COLUMN held_by_rules boolean NOT NULL DEFAULT false,
      ADD CONSTRAINT receiving_checks_status_check CHECK (status IN ('checked','on-hold','quarantined','released')),
      ADD CONSTRAINT receiving_checks_hold_reason CHECK (status NOT IN ('on-hold','quarantined') OR hold_reason IS NOT NULL),
      ADD CONSTRAINT receiving_checks_dates CHECK (expiry_date IS NULL OR production_date IS NULL OR expiry_date >= production_date)`);
    // Checks recorded before: their decision was the hardware verdict alone.
    await q.query(`UPDATE receiving_checks SET decision = CASE verdict WHEN 'no-fit' THEN 'hold' WHEN 'caution' THEN 'caution' ELSE 'accept' END`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`UPDATE receiving_checks SET status = 'on-hold' WHERE status = 'quarantined'`);
    await q.query(`ALTER TABLE receiving_checks
      DROP CONSTRAINT receiving_checks_dates,
      DROP CONSTRAINT receiving_checks_hold_reason,
      DROP CONSTRAINT receiving_checks_status_check,
      DROP COLUMN held_by_rules, DROP COLUMN acceptance, DROP COLUMN decision, DROP COLUMN temperature_indicator, DROP COLUMN expiry_date, DROP COLUMN production_date,
      ALTER COLUMN status TYPE varchar(10),
      ADD CONSTRAINT receiving_checks_status_check CHECK (status IN ('checked','on-hold','released')),
      ADD CONSTRAINT receiving_checks_hold_reason CHECK (status <> 'on-hold' OR hold_reason IS NOT NULL)`);
    await q.query(`ALTER TABLE site_settings DROP COLUMN time_zone`);
    await q.query(`ALTER TABLE attachments DROP COLUMN purpose`);
    await q.query(`ALTER TABLE slurries DROP CONSTRAINT slurries_storage_range, DROP CONSTRAINT slurries_remaining_within_life,
      DROP COLUMN certificate_required, DROP COLUMN storage_max_c, DROP COLUMN storage_min_c, DROP COLUMN min_remaining_days, DROP COLUMN shelf_life_days`);
  }
}
