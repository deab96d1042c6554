import { Field, ID, Int, ObjectType } from '@nestjs/graphql';

import { ArticleKindEnum, ArticleStatusEnum, EvidenceKindEnum } from './field-notes.enums.js';

@ObjectType('FieldNoteTags')
export class FieldNoteTagsModel {
  @Field(() => [String], { description: 'Species ids from the species table' })
  species: string[];

  @Field(() => [String], { description: 'FLAT, CONVEX, CHISEL or COMPOUND' })
  grinds: string[];

  @Field(() => [String], { description: 'Event catalogue codes' })
  events: string[];

  @Field(() => [String], { description: 'GREEN, SEASONED, DRY, PUNKY, FROZEN or KNOTTY' })
  conditions: string[];

  @Field(() => [String])
  free: string[];
}

@ObjectType('EvidenceLink')
export class EvidenceLinkModel {
  @Field(() => EvidenceKindEnum)
  kind: EvidenceKindEnum;

  @Field(() => String, { nullable: true })
  refId: string | null;

  @Field(() => String, { nullable: true })
  species: string | null;

  @Field(() => String, { nullable: true })
  grind: string | null;

  @Field(() => String, { nullable: true })
  condition: string | null;

  @Field(() => String)
  label: string;

  @Field(() => String)
  summary: string;

  @Field(() => String, { description: 'Where the evidence is shown in the app' })
  href: string;
}

/** What every revision holds: the words, the tags and the evidence. */
@ObjectType({ isAbstract: true })
export class FieldNoteContentModel {
  @Field(() => String)
  title: string;

  @Field(() => String)
  summary: string;

  @Field(() => String)
  bodyMarkdown: string;

  @Field(() => FieldNoteTagsModel)
  tags: FieldNoteTagsModel;

  @Field(() => [EvidenceLinkModel])
  evidence: EvidenceLinkModel[];
}

@ObjectType('FieldNote')
export class FieldNoteModel extends FieldNoteContentModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  slug: string;

  @Field(() => ArticleKindEnum)
  kind: ArticleKindEnum;

  @Field(() => ArticleStatusEnum)
  status: ArticleStatusEnum;

  @Field(() => ID)
  authorId: string;

  @Field(() => String)
  authorName: string;

  @Field(() => ID, { description: 'The revision shown: the published one, or the working copy in a draft view' })
  revisionId: string;

  @Field(() => Int)
  revisionNumber: number;

  @Field(() => Boolean, { description: 'This view shows the working copy, not what visitors read' })
  isDraftView: boolean;

  @Field(() => Boolean, { description: 'Visitors can read a published revision' })
  isPublished: boolean;

  @Field(() => Boolean, { description: 'The working copy differs from the published revision' })
  hasUnpublishedChanges: boolean;

  @Field(() => String, { description: 'Rendered on the server by the strict renderer; safe to insert as HTML' })
  bodyHtml: string;

  @Field(() => Date, { nullable: true })
  publishedAt: Date | null;

  @Field(() => Date)
  updatedAt: Date;

  @Field(() => Int, { nullable: true, description: 'Place in the First Cuts series' })
  firstCutsPosition: number | null;

  @Field(() => Date, { nullable: true, description: 'When the signed-in reader marked it read' })
  readAt: Date | null;

  @Field(() => Boolean)
  canEdit: boolean;

  @Field(() => Boolean)
  canSubmit: boolean;

  @Field(() => Boolean)
  canReview: boolean;

  @Field(() => Boolean)
  canPublish: boolean;

  @Field(() => String, { nullable: true, description: 'Why the caller may not publish it (null when they may, or it is not in review)' })
  publishRefusal: string | null;
}
