import type { MigrationInterface, QueryRunner } from 'typeorm';

const TABLE = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

/** The event catalogue, meets, meet events, entries, club invitations and the meet change log. */
export class MeetsAndEntries1764700000000 implements MigrationInterface {
  name = 'MeetsAndEntries1764700000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE event_types (
      id CHAR(36) NOT NULL PRIMARY KEY,
      code VARCHAR(60) NOT NULL,
      name VARCHAR(80) NOT NULL,
      result_kind ENUM('TIMED','SCORED','FEWEST_HITS') NOT NULL,
      team_size TINYINT UNSIGNED NOT NULL DEFAULT 1,
      mixed_pair TINYINT(1) NOT NULL DEFAULT 0,
      uses_head TINYINT(1) NOT NULL DEFAULT 0,
      default_diameter_mm JSON NULL,
      default_penalties JSON NOT NULL,
      description VARCHAR(400) NOT NULL DEFAULT '',
      UNIQUE KEY uq_event_types_code (code)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE meets (
      id CHAR(36) NOT NULL PRIMARY KEY,
      season_id CHAR(36) NOT NULL,
      host_club_id CHAR(36) NOT NULL,
      name VARCHAR(120) NOT NULL,
      starts_on DATE NOT NULL,
      venue VARCHAR(160) NOT NULL,
      entry_deadline DATETIME(3) NOT NULL,
      divisions SET('MENS','WOMENS','MIXED') NOT NULL,
      scoring_scheme ENUM('FIXED_TABLE','FIELD_SIZE','PERCENT_OF_BEST') NOT NULL,
      points_table JSON NULL,
      best_entry_per_club TINYINT(1) NOT NULL DEFAULT 0,
      minimum_one_point TINYINT(1) NOT NULL DEFAULT 0,
      run_off_top_places TINYINT UNSIGNED NOT NULL DEFAULT 0,
      max_events_per_athlete TINYINT UNSIGNED NULL,
      require_mixed_pairs TINYINT(1) NOT NULL DEFAULT 1,
      status ENUM('DRAFT','OPEN','CLOSED','RUNNING','PUBLISHED','ARCHIVED') NOT NULL DEFAULT 'DRAFT',
      created_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_meets_season_date (season_id, starts_on),
      KEY ix_meets_status_date (status, starts_on),
      CONSTRAINT fk_meets_season FOREIGN KEY (season_id) REFERENCES seasons (id),
      CONSTRAINT fk_meets_host FOREIGN KEY (host_club_id) REFERENCES clubs (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE meet_events (
      id CHAR(36) NOT NULL PRIMARY KEY,
      meet_id CHAR(36) NOT NULL,
      event_type_id CHAR(36) NOT NULL,
      division ENUM('MENS','WOMENS','MIXED') NOT NULL,
      species_id VARCHAR(60) NULL,
      diameter_mm DECIMAL(6,1) NULL,
      time_limit_hundredths INT UNSIGNED NULL,
      weight DECIMAL(4,2) NOT NULL DEFAULT 1.00,
      scoring_scheme ENUM('FIXED_TABLE','FIELD_SIZE','PERCENT_OF_BEST') NULL,
      points_table JSON NULL,
      notes VARCHAR(400) NOT NULL DEFAULT '',
      position SMALLINT NOT NULL DEFAULT 0,
      heat_size TINYINT UNSIGNED NULL,
      draw_seed INT UNSIGNED NULL,
      KEY ix_meet_events_meet (meet_id, position),
      CONSTRAINT fk_meet_events_meet FOREIGN KEY (meet_id) REFERENCES meets (id) ON DELETE CASCADE,
      CONSTRAINT fk_meet_events_type FOREIGN KEY (event_type_id) REFERENCES event_types (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE entries (
      id CHAR(36) NOT NULL PRIMARY KEY,
      meet_event_id CHAR(36) NOT NULL,
      club_id CHAR(36) NOT NULL,
      draw_position SMALLINT NULL,
      heat SMALLINT NULL,
      entered_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_entries_event (meet_event_id, draw_position),
      KEY ix_entries_club (club_id),
      CONSTRAINT fk_entries_event FOREIGN KEY (meet_event_id) REFERENCES meet_events (id) ON DELETE CASCADE,
      CONSTRAINT fk_entries_club FOREIGN KEY (club_id) REFERENCES clubs (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE entry_athletes (
      entry_id CHAR(36) NOT NULL,
      athlete_id CHAR(36) NOT NULL,
      meet_event_id CHAR(36) NOT NULL,
      position TINYINT UNSIGNED NOT NULL DEFAULT 1,
      PRIMARY KEY (entry_id, athlete_id),
      UNIQUE KEY uq_entry_athletes_event_athlete (meet_event_id, athlete_id),
      KEY ix_entry_athletes_athlete (athlete_id),
      CONSTRAINT fk_entry_athletes_entry FOREIGN KEY (entry_id) REFERENCES entries (id) ON DELETE CASCADE,
      CONSTRAINT fk_entry_athletes_athlete FOREIGN KEY (athlete_id) REFERENCES athletes (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE meet_changes (
      id CHAR(36) NOT NULL PRIMARY KEY,
      meet_id CHAR(36) NOT NULL,
      user_id CHAR(36) NULL,
      summary VARCHAR(200) NOT NULL,
      \`before\` JSON NOT NULL,
      \`after\` JSON NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_meet_changes_meet (meet_id, created_at),
      CONSTRAINT fk_meet_changes_meet FOREIGN KEY (meet_id) REFERENCES meets (id) ON DELETE CASCADE
    ) ${TABLE}`);
    await q.query(`CREATE TABLE club_invitations (
      id CHAR(36) NOT NULL PRIMARY KEY,
      club_id CHAR(36) NOT NULL,
      email VARCHAR(254) NOT NULL,
      role ENUM('COACH','ATHLETE') NOT NULL,
      token_hash CHAR(64) NOT NULL,
      invited_by CHAR(36) NOT NULL,
      expires_at DATETIME(3) NOT NULL,
      accepted_at DATETIME(3) NULL,
      accepted_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_club_invitations_hash (token_hash),
      KEY ix_club_invitations_club (club_id),
      CONSTRAINT fk_club_invitations_club FOREIGN KEY (club_id) REFERENCES clubs (id) ON DELETE CASCADE
    ) ${TABLE}`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['club_invitations', 'meet_changes', 'entry_athletes', 'entries', 'meet_events', 'meets', 'event_types']) {
      await q.query(`DROP TABLE IF EXISTS ${table}`);
    }
  }
}
