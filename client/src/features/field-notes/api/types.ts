// Shapes of the Field Notes API (server/schema.gql); replace with generated types once codegen lands.
import type { ArticleKind, ArticleStatus, EvidenceKind } from '@endgrain/shared';

export type { ArticleKind, ArticleStatus, EvidenceKind };

export interface NoteTags {
  species: string[];
  grinds: string[];
  events: string[];
  conditions: string[];
  free: string[];
}

export interface EvidenceLink {
  kind: EvidenceKind;
  refId: string | null;
  species: string | null;
  grind: string | null;
  condition: string | null;
  label: string;
  summary: string;
  href: string;
}

export interface FieldNote {
  __typename?: 'FieldNote';
  id: string;
  slug: string;
  kind: ArticleKind;
  status: ArticleStatus;
  authorId: string;
  authorName: string;
  revisionId: string;
  revisionNumber: number;
  isDraftView: boolean;
  isPublished: boolean;
  hasUnpublishedChanges: boolean;
  title: string;
  summary: string;
  bodyMarkdown: string;
  /** Rendered by the server's strict renderer: the only HTML we insert. */
  bodyHtml: string;
  tags: NoteTags;
  evidence: EvidenceLink[];
  publishedAt: string | null;
  updatedAt: string;
  firstCutsPosition: number | null;
  readAt: string | null;
  canEdit: boolean;
  canSubmit: boolean;
  canReview: boolean;
  canPublish: boolean;
  publishRefusal: string | null;
}

export interface NoteRevision {
  id: string;
  number: number;
  title: string;
  summary: string;
  bodyMarkdown: string;
  tags: NoteTags;
  writtenByName: string;
  note: string;
  isPublished: boolean;
  createdAt: string;
}

export type ReviewAction = 'SUBMITTED' | 'SENT_BACK' | 'PUBLISHED' | 'UNPUBLISHED';

export interface NoteReview {
  id: string;
  action: ReviewAction;
  comment: string;
  actorName: string;
  revisionNumber: number;
  createdAt: string;
}

export interface NoteHistory {
  note: FieldNote;
  revisions: NoteRevision[];
  reviews: NoteReview[];
}

export interface FirstCuts {
  steps: { position: number; note: FieldNote }[];
  readCount: number;
}

export interface EvidenceLinkInput {
  kind: EvidenceKind;
  refId?: string | null;
  species?: string | null;
  grind?: string | null;
  condition?: string | null;
  label: string;
  summary: string;
}

export interface FieldNoteInput {
  kind: ArticleKind;
  title: string;
  summary: string;
  bodyMarkdown: string;
  tags: NoteTags;
  evidence: EvidenceLinkInput[];
  note: string;
}

export interface FieldNotesFilter {
  kind?: ArticleKind | null;
  species?: string | null;
  grind?: string | null;
  event?: string | null;
  condition?: string | null;
  limit?: number;
  offset?: number;
}

/** What POST /api/field-notes/images answers. */
export interface UploadedImage {
  id: string;
  url: string;
  markdown: string;
  mimeType: string;
  width: number;
  height: number;
}
