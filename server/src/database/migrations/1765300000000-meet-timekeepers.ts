import type { MigrationInterface, QueryRunner } from 'typeorm';

const TABLE = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

/** Timekeepers an organiser appoints for one meet: they post that meet's results until it is published. */
export class MeetTimekeepers1765300000000 implements MigrationInterface {
  name = 'MeetTimekeepers1765300000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE meet_timekeepers (
      meet_id CHAR(36) NOT NULL,
      user_id CHAR(36) NOT NULL,
      appointed_by CHAR(36) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (meet_id, user_id),
      KEY ix_meet_timekeepers_user (user_id),
      CONSTRAINT fk_meet_timekeepers_meet FOREIGN KEY (meet_id) REFERENCES meets (id) ON DELETE CASCADE,
      CONSTRAINT fk_meet_timekeepers_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE,
      CONSTRAINT fk_meet_timekeepers_by FOREIGN KEY (appointed_by) REFERENCES users (id) ON DELETE SET NULL
    ) ${TABLE}`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query('DROP TABLE meet_timekeepers');
  }
}
