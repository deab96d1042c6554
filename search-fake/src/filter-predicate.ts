import { hasPath, valuesAt, type Doc } from './document-path.js';
import type { CompareOp, FilterNode } from './filter-parser.js';
import { normalizeTerm } from './tokenize.js';

export type Predicate = (doc: Doc) => boolean;

function toNumber(text: string): number | null {
  if (text.trim() === '') return null;
  const value = Number(text);
  return Number.isFinite(value) ? value : null;
}

/** `=` semantics: strings ignore case, numbers compare as numbers, arrays match on any element. */
function equalsPredicate(attribute: string, target: string): Predicate {
  const targetNumber = toNumber(target);
  const targetText = normalizeTerm(target);
  return (doc) =>
    valuesAt(doc, attribute).some((value) => {
      if (typeof value === 'number') return value === targetNumber;
      if (typeof value === 'string') return normalizeTerm(value) === targetText;
      if (typeof value === 'boolean') return String(value) === targetText;
      return false;
    });
}

function orderPredicate(attribute: string, op: CompareOp, target: string): Predicate {
  const targetNumber = toNumber(target);
  const targetText = normalizeTerm(target);
  const holds = (order: number): boolean =>
    op === '>' ? order > 0 : op === '>=' ? order >= 0 : op === '<' ? order < 0 : order <= 0;
  return (doc) =>
    valuesAt(doc, attribute).some((value) => {
      if (typeof value === 'number' && targetNumber !== null) return holds(value - targetNumber);
      // Text against text compares in dictionary order; a number never orders against a word.
      if (typeof value === 'string' && targetNumber === null) {
        const text = normalizeTerm(value);
        return holds(text < targetText ? -1 : text > targetText ? 1 : 0);
      }
      return false;
    });
}

function rangePredicate(attribute: string, low: string, high: string): Predicate {
  const lowNumber = toNumber(low);
  const highNumber = toNumber(high);
  if (lowNumber === null || highNumber === null) return () => false;
  return (doc) =>
    valuesAt(doc, attribute).some(
      (value) => typeof value === 'number' && value >= lowNumber && value <= highNumber,
    );
}

/** Turns a parsed filter into a function over documents. */
export function filterPredicate(node: FilterNode): Predicate {
  switch (node.kind) {
    case 'and': {
      const items = node.items.map(filterPredicate);
      return (doc) => items.every((item) => item(doc));
    }
    case 'or': {
      const items = node.items.map(filterPredicate);
      return (doc) => items.some((item) => item(doc));
    }
    case 'not': {
      const item = filterPredicate(node.item);
      return (doc) => !item(doc);
    }
    case 'compare': {
      if (node.op === '=') return equalsPredicate(node.attribute, node.value);
      if (node.op === '!=') {
        const equals = equalsPredicate(node.attribute, node.value);
        return (doc) => !equals(doc);
      }
      return orderPredicate(node.attribute, node.op, node.value);
    }
    case 'range':
      return rangePredicate(node.attribute, node.low, node.high);
    case 'in': {
      const options = node.values.map((value) => equalsPredicate(node.attribute, value));
      return (doc) => options.some((option) => option(doc));
    }
    case 'exists':
      return (doc) => hasPath(doc, node.attribute);
  }
}

/** Every attribute a filter reads, to check them against the filterable list. */
export function filterAttributes(node: FilterNode, out: Set<string> = new Set()): Set<string> {
  if ('items' in node) node.items.forEach((item) => filterAttributes(item, out));
  else if ('item' in node) filterAttributes(node.item, out);
  else out.add(node.attribute);
  return out;
}
