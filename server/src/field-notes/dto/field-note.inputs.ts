import { Field, ID, InputType, Int } from '@nestjs/graphql';

import { ArticleKindEnum, EvidenceKindEnum } from '../models/field-notes.enums.js';

@InputType()
export class FieldNoteTagsInput {
  @Field(() => [String], { defaultValue: [] })
  species: string[];

  @Field(() => [String], { defaultValue: [] })
  grinds: string[];

  @Field(() => [String], { defaultValue: [] })
  events: string[];

  @Field(() => [String], { defaultValue: [] })
  conditions: string[];

  @Field(() => [String], { defaultValue: [] })
  free: string[];
}

@InputType()
export class EvidenceLinkInput {
  @Field(() => EvidenceKindEnum)
  kind: EvidenceKindEnum;

  @Field(() => ID, { nullable: true, description: 'The trial or result id' })
  refId?: string | null;

  @Field(() => String, { nullable: true })
  species?: string | null;

  @Field(() => String, { nullable: true })
  grind?: string | null;

  @Field(() => String, { nullable: true })
  condition?: string | null;

  @Field(() => String)
  label: string;

  @Field(() => String, { defaultValue: '' })
  summary: string;
}

@InputType()
export class FieldNoteInput {
  @Field(() => ArticleKindEnum, { description: 'Fixed once the note is created' })
  kind: ArticleKindEnum;

  @Field(() => String)
  title: string;

  @Field(() => String)
  summary: string;

  @Field(() => String)
  bodyMarkdown: string;

  @Field(() => FieldNoteTagsInput)
  tags: FieldNoteTagsInput;

  @Field(() => [EvidenceLinkInput], { defaultValue: [] })
  evidence: EvidenceLinkInput[];

  @Field(() => String, { defaultValue: '', description: 'What changed, for the revision list' })
  note: string;
}

@InputType()
export class FieldNotesFilter {
  @Field(() => ArticleKindEnum, { nullable: true })
  kind?: ArticleKindEnum | null;

  @Field(() => String, { nullable: true })
  species?: string | null;

  @Field(() => String, { nullable: true })
  grind?: string | null;

  @Field(() => String, { nullable: true })
  event?: string | null;

  @Field(() => String, { nullable: true })
  condition?: string | null;

  @Field(() => Int, { defaultValue: 50 })
  limit: number;

  @Field(() => Int, { defaultValue: 0 })
  offset: number;
}
