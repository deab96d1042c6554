import type { MigrationInterface, QueryRunner } from 'typeorm';

const TABLE = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';
const STATUS = "ENUM('FINISHED','SCRATCH','DID_NOT_FINISH','DISQUALIFIED')";

/**
 * Results (raw watch times kept, computed place and points stored so the explorer can sort and
 * filter on indexes), per-meet club standings, and the audit log of every change to a result.
 * Meet, season, club, event type, division and date are copied onto each result for the same reason.
 */
export class Results1764900000000 implements MigrationInterface {
  name = 'Results1764900000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE results (
      id CHAR(36) NOT NULL PRIMARY KEY,
      entry_id CHAR(36) NOT NULL,
      meet_event_id CHAR(36) NOT NULL,
      meet_id CHAR(36) NOT NULL,
      season_id CHAR(36) NOT NULL,
      club_id CHAR(36) NOT NULL,
      event_type_id CHAR(36) NOT NULL,
      division ENUM('MENS','WOMENS','MIXED') NOT NULL,
      meet_date DATE NOT NULL,
      status ${STATUS} NOT NULL,
      dq_reason VARCHAR(200) NULL,
      raw_times JSON NOT NULL,
      time_hundredths INT UNSIGNED NULL,
      score DECIMAL(9,2) NULL,
      penalty_hundredths INT UNSIGNED NOT NULL DEFAULT 0,
      run_off_rank TINYINT UNSIGNED NULL,
      final_status ${STATUS} NOT NULL,
      final_reason VARCHAR(200) NULL,
      total_hundredths INT UNSIGNED NULL,
      place SMALLINT UNSIGNED NULL,
      tied TINYINT(1) NOT NULL DEFAULT 0,
      points DECIMAL(8,2) NOT NULL DEFAULT 0,
      counts_for_club TINYINT(1) NOT NULL DEFAULT 1,
      provisional TINYINT(1) NOT NULL DEFAULT 0,
      axe_id CHAR(36) NULL,
      axe_label VARCHAR(40) NULL,
      grind ENUM('FLAT','CONVEX','CHISEL','COMPOUND') NULL,
      bevel_included_deg DECIMAL(5,2) NULL,
      chisel_width_mm DECIMAL(6,2) NULL,
      species_id VARCHAR(60) NULL,
      diameter_mm DECIMAL(6,1) NULL,
      block_condition ENUM('GREEN','SEASONED','DRY','PUNKY','FROZEN','KNOTTY') NULL,
      recorded_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_results_entry (entry_id),
      KEY ix_results_event_place (meet_event_id, place),
      KEY ix_results_meet (meet_id, meet_event_id),
      KEY ix_results_type_division_total (event_type_id, division, total_hundredths),
      KEY ix_results_type_division_score (event_type_id, division, score),
      KEY ix_results_season_date (season_id, meet_date),
      KEY ix_results_club_date (club_id, meet_date),
      KEY ix_results_species_diameter (species_id, diameter_mm, total_hundredths),
      KEY ix_results_grind_bevel (grind, bevel_included_deg),
      KEY ix_results_condition (block_condition, total_hundredths),
      KEY ix_results_date (meet_date),
      CONSTRAINT fk_results_entry FOREIGN KEY (entry_id) REFERENCES entries (id) ON DELETE CASCADE,
      CONSTRAINT fk_results_meet_event FOREIGN KEY (meet_event_id) REFERENCES meet_events (id) ON DELETE CASCADE,
      CONSTRAINT fk_results_meet FOREIGN KEY (meet_id) REFERENCES meets (id) ON DELETE CASCADE,
      CONSTRAINT fk_results_club FOREIGN KEY (club_id) REFERENCES clubs (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE meet_standings (
      meet_id CHAR(36) NOT NULL,
      division ENUM('MENS','WOMENS','MIXED') NOT NULL,
      club_id CHAR(36) NOT NULL,
      points DECIMAL(9,2) NOT NULL,
      place SMALLINT UNSIGNED NOT NULL,
      tied TINYINT(1) NOT NULL DEFAULT 0,
      place_counts JSON NOT NULL,
      provisional TINYINT(1) NOT NULL DEFAULT 0,
      PRIMARY KEY (meet_id, division, club_id),
      KEY ix_meet_standings_club (club_id),
      CONSTRAINT fk_meet_standings_meet FOREIGN KEY (meet_id) REFERENCES meets (id) ON DELETE CASCADE,
      CONSTRAINT fk_meet_standings_club FOREIGN KEY (club_id) REFERENCES clubs (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE result_audit (
      id CHAR(36) NOT NULL PRIMARY KEY,
      result_id CHAR(36) NOT NULL,
      entry_id CHAR(36) NOT NULL,
      meet_id CHAR(36) NOT NULL,
      user_id CHAR(36) NULL,
      action ENUM('RECORDED','CORRECTED','IMPORTED') NOT NULL,
      reason VARCHAR(300) NULL,
      \`before\` JSON NULL,
      \`after\` JSON NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_result_audit_meet (meet_id, created_at),
      KEY ix_result_audit_result (result_id, created_at),
      CONSTRAINT fk_result_audit_meet FOREIGN KEY (meet_id) REFERENCES meets (id) ON DELETE CASCADE
    ) ${TABLE}`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['result_audit', 'meet_standings', 'results']) await q.query(`DROP TABLE IF EXISTS ${table}`);
  }
}
