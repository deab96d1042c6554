import type { MigrationInterface, QueryRunner } from 'typeorm';

const TABLE = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

/**
 * Grain Map: organisers' handicap-mark overrides, and an index that makes the Grain Map's
 * change stamp (row count and newest update per event and division) an index-only range scan,
 * so a cached matrix is re-used only while no result of that event has changed.
 */
export class Insights1765200000000 implements MigrationInterface {
  name = 'Insights1765200000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE handicap_marks (
      meet_event_id CHAR(36) NOT NULL,
      athlete_id CHAR(36) NOT NULL,
      mark_seconds SMALLINT UNSIGNED NOT NULL,
      note VARCHAR(200) NOT NULL DEFAULT '',
      set_by CHAR(36) NULL,
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      PRIMARY KEY (meet_event_id, athlete_id),
      CONSTRAINT fk_handicap_marks_event FOREIGN KEY (meet_event_id) REFERENCES meet_events (id) ON DELETE CASCADE,
      CONSTRAINT fk_handicap_marks_athlete FOREIGN KEY (athlete_id) REFERENCES athletes (id) ON DELETE CASCADE
    ) ${TABLE}`);
    await q.query('CREATE INDEX ix_results_grain_stamp ON results (event_type_id, division, updated_at)');
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP INDEX ix_results_grain_stamp ON results');
    await q.query('DROP TABLE handicap_marks');
  }
}
