import type { MigrationInterface, QueryRunner } from 'typeorm';

const TABLE = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

/** Trials: a club's axe tests on one block, their testers, one run per axe and tester, and published summaries. */
export class Trials1765100000000 implements MigrationInterface {
  name = 'Trials1765100000000';

  async up(q: QueryRunner): Promise<void> {
    // Ids are chosen by the recording phone, so a draft sent twice after a lost connection lands once.
    await q.query(`CREATE TABLE trials (
      id CHAR(36) NOT NULL PRIMARY KEY,
      club_id CHAR(36) NOT NULL,
      tested_on DATE NOT NULL,
      species_id VARCHAR(60) NOT NULL,
      diameter_mm DECIMAL(6,1) NOT NULL,
      block_condition ENUM('GREEN','SEASONED','DRY','PUNKY','FROZEN') NOT NULL,
      knots VARCHAR(200) NOT NULL DEFAULT '',
      face_used VARCHAR(120) NOT NULL DEFAULT '',
      air_temp_c DECIMAL(4,1) NULL,
      reference_axe_id CHAR(36) NOT NULL,
      notes VARCHAR(2000) NOT NULL DEFAULT '',
      version INT UNSIGNED NOT NULL DEFAULT 1,
      save_token VARCHAR(64) NULL,
      recorded_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_trials_club_date (club_id, tested_on),
      KEY ix_trials_wood (species_id, block_condition),
      CONSTRAINT fk_trials_club FOREIGN KEY (club_id) REFERENCES clubs (id),
      CONSTRAINT fk_trials_reference_axe FOREIGN KEY (reference_axe_id) REFERENCES axes (id)
    ) ${TABLE}`);
    // Tester and run ids are the device's own, unique within their trial only.
    await q.query(`CREATE TABLE trial_testers (
      trial_id CHAR(36) NOT NULL,
      id CHAR(36) NOT NULL,
      athlete_id CHAR(36) NULL,
      name VARCHAR(130) NOT NULL,
      position SMALLINT UNSIGNED NOT NULL,
      PRIMARY KEY (trial_id, id),
      CONSTRAINT fk_trial_testers_trial FOREIGN KEY (trial_id) REFERENCES trials (id) ON DELETE CASCADE,
      CONSTRAINT fk_trial_testers_athlete FOREIGN KEY (athlete_id) REFERENCES athletes (id) ON DELETE SET NULL
    ) ${TABLE}`);
    // One axe swung by one tester; grind, bevel and chisel are the head as it was that day.
    await q.query(`CREATE TABLE trial_runs (
      trial_id CHAR(36) NOT NULL,
      id CHAR(36) NOT NULL,
      position SMALLINT UNSIGNED NOT NULL,
      axe_id CHAR(36) NOT NULL,
      tester_id CHAR(36) NOT NULL,
      swings JSON NOT NULL,
      release_step TINYINT UNSIGNED NULL,
      keenness ENUM('DULL','WORKING','KEEN') NULL,
      feel VARCHAR(200) NOT NULL DEFAULT '',
      notes VARCHAR(1000) NOT NULL DEFAULT '',
      grind ENUM('FLAT','CONVEX','CHISEL','COMPOUND') NOT NULL,
      bevel_included_deg DECIMAL(5,2) NULL,
      chisel_width_mm DECIMAL(6,2) NULL,
      PRIMARY KEY (trial_id, id),
      KEY ix_trial_runs_axe (axe_id),
      CONSTRAINT fk_trial_runs_trial FOREIGN KEY (trial_id) REFERENCES trials (id) ON DELETE CASCADE,
      CONSTRAINT fk_trial_runs_tester FOREIGN KEY (trial_id, tester_id) REFERENCES trial_testers (trial_id, id) ON DELETE CASCADE,
      CONSTRAINT fk_trial_runs_axe FOREIGN KEY (axe_id) REFERENCES axes (id)
    ) ${TABLE}`);
    // What "Publish as a finding" wrote: the knowledge base can read it, and the draft note it opened.
    await q.query(`CREATE TABLE trial_summaries (
      trial_id CHAR(36) NOT NULL PRIMARY KEY,
      title VARCHAR(140) NOT NULL,
      summary VARCHAR(300) NOT NULL,
      body_markdown TEXT NOT NULL,
      species_id VARCHAR(60) NOT NULL,
      block_condition ENUM('GREEN','SEASONED','DRY','PUNKY','FROZEN') NOT NULL,
      grinds JSON NOT NULL,
      article_id CHAR(36) NULL,
      article_slug VARCHAR(100) NULL,
      published_by CHAR(36) NULL,
      published_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_trial_summaries_wood (species_id, block_condition),
      CONSTRAINT fk_trial_summaries_trial FOREIGN KEY (trial_id) REFERENCES trials (id) ON DELETE CASCADE
    ) ${TABLE}`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE trial_summaries');
    await q.query('DROP TABLE trial_runs');
    await q.query('DROP TABLE trial_testers');
    await q.query('DROP TABLE trials');
  }
}
