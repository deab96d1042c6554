import { Column, CreateDateColumn, Entity, PrimaryColumn } from 'typeorm';

/** A picture uploaded for a note, checked and stripped of metadata, stored under UPLOAD_DIR. */
@Entity('article_images')
export class ArticleImageEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'uploaded_by', type: 'char', length: 36 })
  uploadedBy: string;

  @Column({ name: 'mime_type', type: 'varchar', length: 40 })
  mimeType: string;

  @Column({ name: 'byte_size', type: 'int', unsigned: true })
  byteSize: number;

  @Column({ name: 'file_name', type: 'varchar', length: 80 })
  fileName: string;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
