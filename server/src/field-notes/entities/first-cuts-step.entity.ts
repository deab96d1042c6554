import { Column, Entity, PrimaryColumn } from 'typeorm';

/** A note's place in the First Cuts series for newcomers. */
@Entity('first_cuts_steps')
export class FirstCutsStepEntity {
  @PrimaryColumn({ name: 'article_id', type: 'char', length: 36 })
  articleId: string;

  @Column({ type: 'smallint', unsigned: true, unique: true })
  position: number;
}
