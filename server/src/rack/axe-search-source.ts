import { grindById, type KnowledgeDocument } from '@endgrain/shared';
import { In } from 'typeorm';

import type { SearchSource } from '../search/search-source.js';
import { AxeEntity } from './entities/axe.entity.js';
import type { RackRepository } from './rack.repository.js';

export const AXE_SEARCH_TYPE = 'axe';
export const AXE_DOCUMENT_PREFIX = 'axe-';

/** Axes a club marked public, as the knowledge index holds them; private ones are removed. */
export class AxeSearchSource implements SearchSource {
  readonly type = AXE_SEARCH_TYPE;

  constructor(private readonly repo: RackRepository) {}

  async documents(ids: string[]): Promise<{ documents: KnowledgeDocument[]; gone: string[] }> {
    const axes = ids.length
      ? await this.repo.db.getRepository(AxeEntity).find({ where: { id: In(ids), isPublic: true }, relations: { club: true } })
      : [];
    const documents = axes.map(toAxeDocument);
    const live = new Set(axes.map((a) => a.id));
    return { documents, gone: ids.filter((id) => !live.has(id)).map((id) => `${AXE_DOCUMENT_PREFIX}${id}`) };
  }

  async allIds(): Promise<string[]> {
    const rows = await this.repo.db.getRepository(AxeEntity).find({ where: { isPublic: true }, select: { id: true } });
    return rows.map((r) => r.id);
  }
}

export function toAxeDocument(axe: AxeEntity): KnowledgeDocument {
  const grind = grindById(axe.grind)?.label ?? axe.grind;
  const setup = [
    grind,
    axe.bevelIncludedDeg != null ? `${axe.bevelIncludedDeg}° included bevel` : null,
    axe.chiselWidthMm != null ? `${axe.chiselWidthMm} mm chisel` : null,
    axe.maker ? `by ${axe.maker}` : null,
  ].filter(Boolean);
  const clubName = axe.club?.name ?? '';
  return {
    id: `${AXE_DOCUMENT_PREFIX}${axe.id}`,
    type: 'axe',
    kind: 'AXE',
    slug: axe.id,
    title: `${axe.label}${clubName ? ` (${clubName})` : ''}`,
    summary: setup.join(', '),
    text: axe.notes ?? '',
    keywords: [grind],
    findingKeywords: [],
    tags: [grind],
    evidence: [],
    species: [],
    grind: [axe.grind],
    event: [],
    condition: [],
    authorName: clubName,
    publishedAt: axe.updatedAt?.getTime() ?? 0,
    url: `/rack/axes/${axe.id}`,
  };
}
