import { EVENT_CATALOGUE } from '../league/index.js';
import { speciesById } from '../species/index.js';
import { conditionById, grindById } from './tag-vocabulary.js';

export interface ArticleTags {
  species: string[];
  grinds: string[];
  events: string[];
  conditions: string[];
  /** Free tags: lower-case words or short phrases. */
  free: string[];
}

export interface TagProblem {
  field: string;
  message: string;
}

export const MAX_TAGS_PER_KIND = 10;
const FREE_TAG = /^[a-z0-9][a-z0-9 -]{0,28}[a-z0-9]$|^[a-z0-9]$/;

export function emptyTags(): ArticleTags {
  return { species: [], grinds: [], events: [], conditions: [], free: [] };
}

function known(field: keyof ArticleTags, values: string[], isKnown: (v: string) => boolean, what: string, problems: TagProblem[]): string[] {
  const unique = [...new Set(values.map((v) => v.trim()).filter(Boolean))];
  if (unique.length > MAX_TAGS_PER_KIND) problems.push({ field: `tags.${field}`, message: `At most ${MAX_TAGS_PER_KIND} ${what} tags.` });
  for (const value of unique) {
    if (!isKnown(value)) problems.push({ field: `tags.${field}`, message: `"${value}" is not a ${what} Endgrain knows.` });
  }
  return unique;
}

/** Checks tags against the species table, the grinds, the event catalogue and the block conditions. */
export function checkArticleTags(input: Partial<ArticleTags>): { tags: ArticleTags; problems: TagProblem[] } {
  const problems: TagProblem[] = [];
  const free = [...new Set((input.free ?? []).map((t) => t.trim().toLowerCase().replace(/\s+/g, ' ')).filter(Boolean))];
  const tags: ArticleTags = {
    species: known('species', input.species ?? [], (v) => speciesById(v) !== undefined, 'species', problems),
    grinds: known('grinds', input.grinds ?? [], (v) => grindById(v) !== undefined, 'grind', problems),
    events: known('events', input.events ?? [], (v) => EVENT_CATALOGUE.some((e) => e.code === v), 'event', problems),
    conditions: known('conditions', input.conditions ?? [], (v) => conditionById(v) !== undefined, 'block condition', problems),
    free: known('free', free, (v) => FREE_TAG.test(v), 'free tag (letters, digits, spaces or hyphens, up to 30)', problems),
  };
  return { tags, problems };
}
