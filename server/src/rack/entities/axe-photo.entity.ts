import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn, type Relation } from 'typeorm';

import { AxeEntity } from './axe.entity.js';

export type PhotoMimeValue = 'image/jpeg' | 'image/png' | 'image/webp';

/** A photo of an axe; the file (metadata stripped) lives under UPLOAD_DIR. */
@Entity('axe_photos')
@Index('ix_axe_photos_axe', ['axeId', 'createdAt'])
export class AxePhotoEntity {
  @PrimaryColumn({ type: 'char', length: 36 })
  id: string;

  @Column({ name: 'axe_id', type: 'char', length: 36 })
  axeId: string;

  @ManyToOne(() => AxeEntity, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'axe_id' })
  axe: Relation<AxeEntity>;

  /** File name inside the rack upload folder; chosen by the server, never by the uploader. */
  @Column({ name: 'file_name', type: 'varchar', length: 60 })
  fileName: string;

  @Column({ name: 'mime_type', type: 'enum', enum: ['image/jpeg', 'image/png', 'image/webp'] })
  mimeType: PhotoMimeValue;

  @Column({ name: 'byte_size', type: 'int', unsigned: true })
  byteSize: number;

  /** Pixel size as displayed (after any orientation turn). */
  @Column({ type: 'int', unsigned: true })
  width: number;

  @Column({ type: 'int', unsigned: true })
  height: number;

  @Column({ type: 'varchar', length: 200, default: '' })
  caption: string;

  @Column({ name: 'uploaded_by', type: 'char', length: 36, nullable: true })
  uploadedBy: string | null;

  @CreateDateColumn({ name: 'created_at', type: 'datetime', precision: 3 })
  createdAt: Date;
}
