import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Accounts, roles, club memberships, e-mail tokens, sign-in throttling, and the league core. */
export class AccountsAndLeague1764600000000 implements MigrationInterface {
  name = 'AccountsAndLeague1764600000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE users (
      id CHAR(36) NOT NULL PRIMARY KEY,
      email VARCHAR(254) NOT NULL,
      password_hash VARCHAR(100) NOT NULL,
      display_name VARCHAR(80) NOT NULL,
      role ENUM('ADMIN','ORGANISER','COACH','ATHLETE') NOT NULL DEFAULT 'ATHLETE',
      email_verified_at DATETIME(3) NULL,
      unit_system ENUM('METRIC','IMPERIAL') NOT NULL DEFAULT 'METRIC',
      token_version INT NOT NULL DEFAULT 0,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_users_email (email)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE seasons (
      id CHAR(36) NOT NULL PRIMARY KEY,
      name VARCHAR(80) NOT NULL,
      starts_on DATE NOT NULL,
      ends_on DATE NOT NULL,
      is_current TINYINT(1) NOT NULL DEFAULT 0,
      UNIQUE KEY uq_seasons_name (name)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE clubs (
      id CHAR(36) NOT NULL PRIMARY KEY,
      name VARCHAR(120) NOT NULL,
      short_name VARCHAR(16) NOT NULL,
      region VARCHAR(80) NOT NULL,
      contact_email VARCHAR(254) NULL,
      colour_primary CHAR(7) NOT NULL DEFAULT '#2f5d3a',
      colour_secondary CHAR(7) NOT NULL DEFAULT '#c9a66b',
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_clubs_name (name),
      UNIQUE KEY uq_clubs_short_name (short_name)
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE club_memberships (
      id CHAR(36) NOT NULL PRIMARY KEY,
      user_id CHAR(36) NOT NULL,
      club_id CHAR(36) NOT NULL,
      role ENUM('COACH','ATHLETE') NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_membership_user_club (user_id, club_id),
      KEY ix_membership_club (club_id),
      CONSTRAINT fk_membership_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE,
      CONSTRAINT fk_membership_club FOREIGN KEY (club_id) REFERENCES clubs (id) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE athletes (
      id CHAR(36) NOT NULL PRIMARY KEY,
      club_id CHAR(36) NOT NULL,
      user_id CHAR(36) NULL,
      first_name VARCHAR(60) NOT NULL,
      last_name VARCHAR(60) NOT NULL,
      divisions SET('MENS','WOMENS','MIXED') NOT NULL,
      experience ENUM('ROOKIE','DEVELOPING','EXPERIENCED') NOT NULL DEFAULT 'ROOKIE',
      first_season_year SMALLINT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_athletes_user (user_id),
      KEY ix_athletes_club (club_id),
      CONSTRAINT fk_athletes_club FOREIGN KEY (club_id) REFERENCES clubs (id) ON DELETE RESTRICT,
      CONSTRAINT fk_athletes_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE SET NULL
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    await q.query(`CREATE TABLE email_tokens (
      id CHAR(36) NOT NULL PRIMARY KEY,
      user_id CHAR(36) NOT NULL,
      purpose ENUM('VERIFY_EMAIL','RESET_PASSWORD') NOT NULL,
      token_hash CHAR(64) NOT NULL,
      expires_at DATETIME(3) NOT NULL,
      used_at DATETIME(3) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_email_tokens_hash (token_hash),
      KEY ix_email_tokens_user (user_id),
      CONSTRAINT fk_email_tokens_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE
    ) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci`);
    // Shared by every server instance, so throttling holds behind a load balancer.
    await q.query(`CREATE TABLE rate_limits (
      \`key\` VARCHAR(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL PRIMARY KEY,
      points INT NOT NULL DEFAULT 0,
      expire BIGINT UNSIGNED NULL,
      KEY ix_rate_limits_expire (expire)
    ) ENGINE=InnoDB`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['rate_limits', 'email_tokens', 'athletes', 'club_memberships', 'clubs', 'seasons', 'users']) {
      await q.query(`DROP TABLE IF EXISTS ${table}`);
    }
  }
}
