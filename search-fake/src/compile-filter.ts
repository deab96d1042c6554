import { ApiError } from './api-error.js';
import { attributeAllowed, listForMessage } from './attribute-patterns.js';
import { parseFilter, type FilterNode } from './filter-parser.js';
import { filterAttributes, filterPredicate, type Predicate } from './filter-predicate.js';

interface CompiledFilter {
  predicate: Predicate;
  attributes: string[];
}

// Parsed filters are reused: a search-as-you-type client repeats the same filter on every key.
const cache = new Map<string, CompiledFilter>();
const CACHE_LIMIT = 1000;

function toNode(filter: unknown, code: string): FilterNode | null {
  if (typeof filter === 'string') return filter.trim() === '' ? null : parseFilter(filter);
  if (!Array.isArray(filter)) {
    throw new ApiError(code, 'A filter is a string, or an array of strings and arrays of strings.');
  }
  // Outer elements are joined by AND, an inner array by OR; no deeper nesting.
  const items: FilterNode[] = [];
  for (const element of filter) {
    if (typeof element === 'string') {
      if (element.trim() !== '') items.push(parseFilter(element));
    } else if (Array.isArray(element)) {
      const alternatives = element.map((inner) => {
        if (typeof inner !== 'string') {
          throw new ApiError(code, 'A filter array nests two levels at most, and its innermost elements are strings.');
        }
        return parseFilter(inner);
      });
      if (alternatives.length > 0) items.push(alternatives.length === 1 ? (alternatives[0] as FilterNode) : { kind: 'or', items: alternatives });
    } else {
      throw new ApiError(code, `A filter array holds strings or arrays of strings, not ${JSON.stringify(element)}.`);
    }
  }
  if (items.length === 0) return null;
  return items.length === 1 ? (items[0] as FilterNode) : { kind: 'and', items };
}

function compile(filter: unknown, code: string): CompiledFilter | null {
  const key = JSON.stringify(filter);
  const cached = cache.get(key);
  if (cached !== undefined) return cached;
  let node: FilterNode | null;
  try {
    node = toNode(filter, code);
  } catch (error) {
    // The parser speaks for searches; a document deletion reports under its own code.
    if (error instanceof ApiError && error.code !== code) throw new ApiError(code, error.message);
    throw error;
  }
  if (node === null) return null;
  const compiled = { predicate: filterPredicate(node), attributes: [...filterAttributes(node)] };
  if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
  cache.set(key, compiled);
  return compiled;
}

/**
 * A predicate for a filter in string or array form, or null when there is no filter.
 * Throws `invalid_search_filter` (or the given code) for bad syntax or an attribute that is not filterable.
 */
export function compileFilter(
  filter: unknown,
  filterable: readonly string[],
  code = 'invalid_search_filter',
): Predicate | null {
  if (filter === undefined || filter === null) return null;
  const compiled = compile(filter, code);
  if (compiled === null) return null;
  for (const attribute of compiled.attributes) {
    if (!attributeAllowed(attribute, filterable)) {
      throw new ApiError(
        code,
        `Attribute \`${attribute}\` is not filterable. Filterable attributes: ${listForMessage(filterable)}.`,
      );
    }
  }
  return compiled.predicate;
}
