import { Field, ID, Int, ObjectType } from '@nestjs/graphql';

import { FieldNoteContentModel, FieldNoteModel } from './field-note.model.js';
import { ReviewActionEnum } from './field-notes.enums.js';

@ObjectType('FieldNoteRevision')
export class FieldNoteRevisionModel extends FieldNoteContentModel {
  @Field(() => ID)
  id: string;

  @Field(() => Int)
  number: number;

  @Field(() => String)
  writtenByName: string;

  @Field(() => String)
  note: string;

  @Field(() => Boolean, { description: 'The revision visitors read now' })
  isPublished: boolean;

  @Field(() => Date)
  createdAt: Date;
}

@ObjectType('FieldNoteReview')
export class FieldNoteReviewModel {
  @Field(() => ID)
  id: string;

  @Field(() => ReviewActionEnum)
  action: ReviewActionEnum;

  @Field(() => String)
  comment: string;

  @Field(() => String)
  actorName: string;

  @Field(() => Int)
  revisionNumber: number;

  @Field(() => Date)
  createdAt: Date;
}

@ObjectType('FieldNoteHistory')
export class FieldNoteHistoryModel {
  @Field(() => FieldNoteModel, { description: 'The working copy' })
  note: FieldNoteModel;

  @Field(() => [FieldNoteRevisionModel], { description: 'Newest first' })
  revisions: FieldNoteRevisionModel[];

  @Field(() => [FieldNoteReviewModel], { description: 'Newest first' })
  reviews: FieldNoteReviewModel[];
}
