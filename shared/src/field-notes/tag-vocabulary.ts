import { EVENT_CATALOGUE } from '../league/index.js';
import { BLOCK_CONDITION_LABELS, BLOCK_CONDITIONS, HEAD_GRIND_LABELS, HEAD_GRINDS, type BlockCondition, type HeadGrind } from '../results/index.js';
import { SPECIES_TABLE, speciesById } from '../species/index.js';

export interface TagTerm {
  id: string;
  label: string;
  /** Words people use for it, added to search documents so plain questions find it. */
  words: readonly string[];
}

// Words people use for each condition and grind, added to search documents so plain questions find them.
const CONDITION_WORDS: Record<BlockCondition, readonly string[]> = {
  GREEN: ['green', 'wet', 'fresh', 'sappy', 'unseasoned'],
  SEASONED: ['seasoned', 'aged'],
  DRY: ['dry', 'dried'],
  PUNKY: ['punky', 'soft', 'rotten'],
  FROZEN: ['frozen', 'ice', 'winter'],
  KNOTTY: ['knotty', 'knots'],
};
const GRIND_WORDS: Record<HeadGrind, readonly string[]> = {
  FLAT: ['flat'],
  CONVEX: ['convex', 'banana', 'rolled'],
  CHISEL: ['chisel', 'secondary'],
  COMPOUND: ['compound'],
};

/** Block conditions as results and trials record them (ids and labels from shared/results). */
export const CONDITION_TAGS: readonly TagTerm[] = BLOCK_CONDITIONS.map((id) => ({ id, label: BLOCK_CONDITION_LABELS[id], words: CONDITION_WORDS[id] }));

/** Grind profiles as the Rack and result snapshots record them. */
export const GRIND_TAGS: readonly TagTerm[] = HEAD_GRINDS.map((id) => ({ id, label: HEAD_GRIND_LABELS[id], words: GRIND_WORDS[id] }));

// Trade names that cover several table species: aspens and cottonwoods are poplars (Populus);
// yellow-poplar is not, but everyone calls its wood poplar.
const SPECIES_EXTRA_WORDS: Record<string, readonly string[]> = {
  'quaking-aspen': ['poplar', 'popple', 'populus'],
  'bigtooth-aspen': ['poplar', 'popple', 'populus'],
  'eastern-cottonwood': ['poplar', 'populus'],
  'black-cottonwood': ['poplar', 'populus'],
  'balsam-poplar': ['populus'],
  'yellow-poplar': ['tulip'],
  'american-basswood': ['linden'],
};

export function conditionById(id: string): TagTerm | undefined {
  return CONDITION_TAGS.find((c) => c.id === id);
}

export function grindById(id: string): TagTerm | undefined {
  return GRIND_TAGS.find((g) => g.id === id);
}

export function eventName(code: string): string | undefined {
  return EVENT_CATALOGUE.find((e) => e.code === code)?.name;
}

export function speciesName(id: string): string | undefined {
  return speciesById(id)?.commonName;
}

/** The species people can tag, in table order. */
export function taggableSpecies(): TagTerm[] {
  return SPECIES_TABLE.map((s) => ({ id: s.id, label: s.commonName, words: speciesWords(s.id) }));
}

/** Words for a species: its common name's words and the trade names that cover it. */
export function speciesWords(id: string): string[] {
  const name = speciesName(id);
  if (!name) return [];
  const own = name.toLowerCase().split(/[^a-z]+/).filter(Boolean);
  return [...new Set([...own, ...(SPECIES_EXTRA_WORDS[id] ?? [])])];
}
