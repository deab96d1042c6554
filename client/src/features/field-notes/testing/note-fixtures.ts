import { renderMarkdown } from '@endgrain/shared';

import type { FieldNote } from '../api/types.js';

/** An invented published finding for component tests; override what a test is about. */
export function testNote(over: Partial<FieldNote> = {}): FieldNote {
  const bodyMarkdown = over.bodyMarkdown ?? '# What we saw\n\nChisels cut **deeper**.';
  return {
    __typename: 'FieldNote',
    id: 'note-1',
    slug: 'chisels-in-green-aspen',
    kind: 'FINDING',
    status: 'PUBLISHED',
    authorId: 'user-coach',
    authorName: 'Tamsin Oakridge',
    revisionId: 'rev-1',
    revisionNumber: 1,
    isDraftView: false,
    isPublished: true,
    hasUnpublishedChanges: false,
    title: 'Chisels held their speed in green aspen',
    summary: 'Demo: chisel grinds cut deeper per swing on wet aspen.',
    bodyMarkdown,
    bodyHtml: renderMarkdown(bodyMarkdown),
    tags: { species: ['quaking-aspen'], grinds: ['CHISEL'], events: [], conditions: ['GREEN'], free: [] },
    evidence: [
      { kind: 'GRAIN_CELL', refId: null, species: 'quaking-aspen', grind: 'CHISEL', condition: 'GREEN', label: 'Green aspen × chisel', summary: '14 results, 6 athletes', href: '/grain-map?species=quaking-aspen&condition=GREEN&cell=quaking-aspen~CHISEL' },
    ],
    publishedAt: '2026-10-20T15:00:00.000Z',
    updatedAt: '2026-10-20T15:00:00.000Z',
    firstCutsPosition: null,
    readAt: null,
    canEdit: false,
    canSubmit: false,
    canReview: false,
    canPublish: false,
    publishRefusal: null,
    ...over,
  };
}
