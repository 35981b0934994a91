import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Where every server process counts failed sign-ins (server/auth/sign-in-limits.ts). */
export const SIGN_IN_COUNTERS_TABLE = 'sign_in_counters';

// The columns are the ones rate-limiter-flexible's RateLimiterPostgres reads and writes (key, points,
// expire in epoch ms). Created here so that no server process creates schema while serving (the
// limiter is told `tableCreated`). The expire index serves its periodic delete of expired rows.
export class SignInCounters1764648000000 implements MigrationInterface {
  name = 'SignInCounters1764648000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE ${SIGN_IN_COUNTERS_TABLE} (key varchar(255) PRIMARY KEY, points integer NOT NULL DEFAULT 0, expire bigint)`);
    await q.query(`CREATE INDEX ${SIGN_IN_COUNTERS_TABLE}_expire_idx ON ${SIGN_IN_COUNTERS_TABLE} (expire)`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE ${SIGN_IN_COUNTERS_TABLE}`);
  }
}
