import { ApiError } from './api-error.js';
import { attributeAllowed, listForMessage } from './attribute-patterns.js';
import { valuesAt, type Doc } from './document-path.js';
import { normalizeTerm } from './tokenize.js';

interface SortRule {
  attribute: string;
  descending: boolean;
}

/** A sort key per rule: numbers come before text, and documents without the field come last. */
type SortKey = readonly [group: 0 | 1 | 2, value: number | string];

export interface SortOrder {
  keysOf(doc: Doc): SortKey[];
  compare(a: SortKey[], b: SortKey[]): number;
}

const RULE = /^([^:\s]+):(asc|desc)$/;

function parseRules(sort: readonly string[], sortable: readonly string[]): SortRule[] {
  return sort.map((text) => {
    const match = RULE.exec(text.trim());
    if (match === null) {
      throw new ApiError('invalid_search_sort', `Sort rule \`${text}\` should read \`attribute:asc\` or \`attribute:desc\`.`);
    }
    const attribute = match[1] as string;
    if (!attributeAllowed(attribute, sortable)) {
      throw new ApiError('invalid_search_sort', `Attribute \`${attribute}\` is not sortable. Sortable attributes: ${listForMessage(sortable)}.`);
    }
    return { attribute, descending: match[2] === 'desc' };
  });
}

function keyFor(doc: Doc, rule: SortRule): SortKey {
  const values = valuesAt(doc, rule.attribute);
  const pick = <T>(items: T[]): T => items.reduce((best, item) => ((rule.descending ? item > best : item < best) ? item : best));
  const numbers = values.filter((value): value is number => typeof value === 'number');
  if (numbers.length > 0) return [0, pick(numbers)];
  const texts = values.filter((value): value is string => typeof value === 'string').map(normalizeTerm);
  if (texts.length > 0) return [1, pick(texts)];
  return [2, 0];
}

/** Checks `attr:asc` / `attr:desc` rules against the sortable attributes and builds a comparator. */
export function compileSort(sort: readonly string[], sortable: readonly string[]): SortOrder {
  const rules = parseRules(sort, sortable);
  return {
    keysOf: (doc) => rules.map((rule) => keyFor(doc, rule)),
    compare(a, b) {
      for (let i = 0; i < rules.length; i += 1) {
        const [groupA, valueA] = a[i] as SortKey;
        const [groupB, valueB] = b[i] as SortKey;
        if (groupA !== groupB) return groupA - groupB;
        if (groupA === 2 || valueA === valueB) continue;
        const order = valueA < valueB ? -1 : 1;
        return (rules[i] as SortRule).descending ? -order : order;
      }
      return 0;
    },
  };
}
