import { registerEnumType } from '@nestjs/graphql';

export enum ArticleKindEnum {
  FINDING = 'FINDING',
  GUIDE = 'GUIDE',
  SAFETY_NOTE = 'SAFETY_NOTE',
}
registerEnumType(ArticleKindEnum, { name: 'FieldNoteKind', description: 'A finding (a claim backed by evidence), a guide, or a safety note' });

export enum ArticleStatusEnum {
  DRAFT = 'DRAFT',
  IN_REVIEW = 'IN_REVIEW',
  PUBLISHED = 'PUBLISHED',
}
registerEnumType(ArticleStatusEnum, { name: 'FieldNoteStatus', description: 'The state of the latest revision: draft → in review → published' });

export enum EvidenceKindEnum {
  TRIAL = 'TRIAL',
  RESULT = 'RESULT',
  GRAIN_CELL = 'GRAIN_CELL',
}
registerEnumType(EvidenceKindEnum, { name: 'EvidenceKind', description: 'A trial, a result, or a Grain Map cell (species × grind)' });

export enum ReviewActionEnum {
  SUBMITTED = 'SUBMITTED',
  SENT_BACK = 'SENT_BACK',
  PUBLISHED = 'PUBLISHED',
  UNPUBLISHED = 'UNPUBLISHED',
}
registerEnumType(ReviewActionEnum, { name: 'FieldNoteReviewAction' });
