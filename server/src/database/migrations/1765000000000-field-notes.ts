import type { MigrationInterface, QueryRunner } from 'typeorm';

const TABLE = 'ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci';

/** Field Notes (articles, revisions, reviews), the First Cuts series, reading progress, pictures, and the search outbox. */
export class FieldNotes1765000000000 implements MigrationInterface {
  name = 'FieldNotes1765000000000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`CREATE TABLE articles (
      id CHAR(36) NOT NULL PRIMARY KEY,
      slug VARCHAR(100) NOT NULL,
      kind ENUM('FINDING','GUIDE','SAFETY_NOTE') NOT NULL,
      status ENUM('DRAFT','IN_REVIEW','PUBLISHED') NOT NULL DEFAULT 'DRAFT',
      author_id CHAR(36) NOT NULL,
      latest_revision_id CHAR(36) NULL,
      published_revision_id CHAR(36) NULL,
      published_at DATETIME(3) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      updated_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3) ON UPDATE CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_articles_slug (slug),
      KEY ix_articles_status (status, updated_at),
      KEY ix_articles_author (author_id, updated_at),
      KEY ix_articles_published (published_revision_id, published_at),
      CONSTRAINT fk_articles_author FOREIGN KEY (author_id) REFERENCES users (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE article_revisions (
      id CHAR(36) NOT NULL PRIMARY KEY,
      article_id CHAR(36) NOT NULL,
      number SMALLINT UNSIGNED NOT NULL,
      title VARCHAR(140) NOT NULL,
      summary VARCHAR(300) NOT NULL,
      body_markdown MEDIUMTEXT NOT NULL,
      body_html MEDIUMTEXT NOT NULL,
      tags JSON NOT NULL,
      evidence JSON NOT NULL,
      written_by CHAR(36) NOT NULL,
      note VARCHAR(200) NOT NULL DEFAULT '',
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_article_revisions_number (article_id, number),
      CONSTRAINT fk_article_revisions_article FOREIGN KEY (article_id) REFERENCES articles (id) ON DELETE CASCADE,
      CONSTRAINT fk_article_revisions_writer FOREIGN KEY (written_by) REFERENCES users (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE article_reviews (
      id CHAR(36) NOT NULL PRIMARY KEY,
      article_id CHAR(36) NOT NULL,
      revision_id CHAR(36) NOT NULL,
      actor_id CHAR(36) NOT NULL,
      action ENUM('SUBMITTED','SENT_BACK','PUBLISHED','UNPUBLISHED') NOT NULL,
      comment VARCHAR(2000) NOT NULL DEFAULT '',
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_article_reviews_article (article_id, created_at),
      CONSTRAINT fk_article_reviews_article FOREIGN KEY (article_id) REFERENCES articles (id) ON DELETE CASCADE,
      CONSTRAINT fk_article_reviews_revision FOREIGN KEY (revision_id) REFERENCES article_revisions (id) ON DELETE CASCADE,
      CONSTRAINT fk_article_reviews_actor FOREIGN KEY (actor_id) REFERENCES users (id)
    ) ${TABLE}`);
    await q.query(`CREATE TABLE first_cuts_steps (
      article_id CHAR(36) NOT NULL PRIMARY KEY,
      position SMALLINT UNSIGNED NOT NULL,
      UNIQUE KEY uq_first_cuts_position (position),
      CONSTRAINT fk_first_cuts_article FOREIGN KEY (article_id) REFERENCES articles (id) ON DELETE CASCADE
    ) ${TABLE}`);
    await q.query(`CREATE TABLE reading_progress (
      user_id CHAR(36) NOT NULL,
      article_id CHAR(36) NOT NULL,
      read_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      PRIMARY KEY (user_id, article_id),
      CONSTRAINT fk_reading_progress_user FOREIGN KEY (user_id) REFERENCES users (id) ON DELETE CASCADE,
      CONSTRAINT fk_reading_progress_article FOREIGN KEY (article_id) REFERENCES articles (id) ON DELETE CASCADE
    ) ${TABLE}`);
    await q.query(`CREATE TABLE article_images (
      id CHAR(36) NOT NULL PRIMARY KEY,
      uploaded_by CHAR(36) NOT NULL,
      mime_type VARCHAR(40) NOT NULL,
      byte_size INT UNSIGNED NOT NULL,
      file_name VARCHAR(80) NOT NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      KEY ix_article_images_uploader (uploaded_by, created_at),
      CONSTRAINT fk_article_images_uploader FOREIGN KEY (uploaded_by) REFERENCES users (id)
    ) ${TABLE}`);
    // One row per document waiting to be (re)indexed; the version guards a change made while a send is in flight.
    await q.query(`CREATE TABLE search_outbox (
      id BIGINT UNSIGNED NOT NULL AUTO_INCREMENT PRIMARY KEY,
      doc_type VARCHAR(20) NOT NULL,
      doc_id CHAR(36) NOT NULL,
      version INT UNSIGNED NOT NULL DEFAULT 1,
      attempts INT UNSIGNED NOT NULL DEFAULT 0,
      last_error VARCHAR(500) NULL,
      due_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      claim_token CHAR(36) NULL,
      claimed_until DATETIME(3) NULL,
      created_at DATETIME(3) NOT NULL DEFAULT CURRENT_TIMESTAMP(3),
      UNIQUE KEY uq_search_outbox_doc (doc_type, doc_id),
      KEY ix_search_outbox_due (due_at)
    ) ${TABLE}`);
  }

  async down(q: QueryRunner): Promise<void> {
    for (const table of ['search_outbox', 'article_images', 'reading_progress', 'first_cuts_steps', 'article_reviews', 'article_revisions', 'articles']) {
      await q.query(`DROP TABLE IF EXISTS ${table}`);
    }
  }
}
