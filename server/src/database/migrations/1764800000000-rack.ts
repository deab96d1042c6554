import type { MigrationInterface, QueryRunner } from 'typeorm';

const TABLE = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

/** The Rack: axes, their service log and photos, meet lineups and the override record. */
export class Rack1764800000000 implements MigrationInterface {
  name = 'Rack1764800000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE axes (
      id CHAR(36) NOT NULL PRIMARY KEY,
      club_id CHAR(36) NOT NULL,
      label VARCHAR(40) NOT NULL,
      maker VARCHAR(80) NOT NULL DEFAULT '',
      head_weight_g INT UNSIGNED NULL,
      bit_width_mm DECIMAL(6,2) NULL,
      grind ENUM('FLAT','CONVEX','CHISEL','COMPOUND') NOT NULL,
      bevel_included_deg DECIMAL(5,2) NULL,
      chisel_width_mm DECIMAL(6,2) NULL,
      handle_length_mm DECIMAL(6,1) NULL,
      handle_wood VARCHAR(40) NOT NULL DEFAULT '',
      hang_checked TINYINT(1) NOT NULL DEFAULT 0,
      pinned TINYINT(1) NOT NULL DEFAULT 0,
      status ENUM('READY','NEEDS_EDGE','NEEDS_HANDLE','HEAD_LOOSE','RETIRED') NOT NULL DEFAULT 'READY',
      allowed_for ENUM('ANYONE','DEVELOPING_UP','EXPERIENCED_ONLY') NOT NULL DEFAULT 'ANYONE',
      is_public TINYINT(1) NOT NULL DEFAULT 0,
      notes VARCHAR(2000) NOT NULL DEFAULT '',
      created_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_axes_club_label (club_id, label),
      KEY ix_axes_club_status (club_id, status),
      CONSTRAINT fk_axes_club FOREIGN KEY (club_id) REFERENCES clubs (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE axe_services (
      id CHAR(36) NOT NULL PRIMARY KEY,
      axe_id CHAR(36) NOT NULL,
      kind ENUM('REGRIND','HONE','REHANG','TIGHTEN_OR_PIN','INSPECT','RETIRE','SETUP_CORRECTED') NOT NULL,
      done_on DATE NOT NULL,
      done_by VARCHAR(80) NOT NULL,
      logged_by CHAR(36) NULL,
      notes VARCHAR(1000) NOT NULL DEFAULT '',
      changes JSON NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_axe_services_axe (axe_id, done_on),
      CONSTRAINT fk_axe_services_axe FOREIGN KEY (axe_id) REFERENCES axes (id) ON DELETE CASCADE
    ) ${TABLE}`);
    await q.query(`CREATE TABLE axe_photos (
      id CHAR(36) NOT NULL PRIMARY KEY,
      axe_id CHAR(36) NOT NULL,
      file_name VARCHAR(60) NOT NULL,
      mime_type ENUM('image/jpeg','image/png','image/webp') NOT NULL,
      byte_size INT UNSIGNED NOT NULL,
      width INT UNSIGNED NOT NULL,
      height INT UNSIGNED NOT NULL,
      caption VARCHAR(200) NOT NULL DEFAULT '',
      uploaded_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_axe_photos_axe (axe_id, created_at),
      CONSTRAINT fk_axe_photos_axe FOREIGN KEY (axe_id) REFERENCES axes (id) ON DELETE CASCADE
    ) ${TABLE}`);
    await q.query(`CREATE TABLE lineup_assignments (
      entry_id CHAR(36) NOT NULL PRIMARY KEY,
      athlete_id CHAR(36) NOT NULL,
      axe_id CHAR(36) NULL,
      override_id CHAR(36) NULL,
      assigned_by CHAR(36) NULL,
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      KEY ix_lineup_assignments_axe (axe_id),
      CONSTRAINT fk_lineup_assignments_entry FOREIGN KEY (entry_id) REFERENCES entries (id) ON DELETE CASCADE,
      CONSTRAINT fk_lineup_assignments_athlete FOREIGN KEY (athlete_id) REFERENCES athletes (id) ON DELETE CASCADE,
      CONSTRAINT fk_lineup_assignments_axe FOREIGN KEY (axe_id) REFERENCES axes (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE lineup_overrides (
      id CHAR(36) NOT NULL PRIMARY KEY,
      club_id CHAR(36) NOT NULL,
      meet_id CHAR(36) NOT NULL,
      entry_id CHAR(36) NOT NULL,
      athlete_id CHAR(36) NOT NULL,
      athlete_name VARCHAR(130) NOT NULL,
      athlete_experience ENUM('ROOKIE','DEVELOPING','EXPERIENCED') NOT NULL,
      axe_id CHAR(36) NOT NULL,
      axe_label VARCHAR(40) NOT NULL,
      axe_allowed_for ENUM('ANYONE','DEVELOPING_UP','EXPERIENCED_ONLY') NOT NULL,
      reason VARCHAR(300) NOT NULL,
      by_user_id CHAR(36) NULL,
      by_name VARCHAR(80) NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_lineup_overrides_entry (entry_id, created_at),
      KEY ix_lineup_overrides_club (club_id, created_at)
    ) ${TABLE}`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['lineup_overrides', 'lineup_assignments', 'axe_photos', 'axe_services', 'axes']) {
      await q.query(`DROP TABLE IF EXISTS ${table}`);
    }
  }
}
