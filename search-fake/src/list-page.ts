import { ApiError } from './api-error.js';

function readCount(query: URLSearchParams, name: string, fallback: number, code: string): number {
  const text = query.get(name);
  if (text === null) return fallback;
  const value = Number(text);
  if (!Number.isInteger(value) || value < 0) throw new ApiError(code, `\`${name}\` is a non-negative integer, not \`${text}\`.`);
  return value;
}

/** `{results, offset, limit, total}` for the list routes (indexes, documents, keys). */
export function listPage<T>(items: readonly T[], query: URLSearchParams, codePrefix: string) {
  const offset = readCount(query, 'offset', 0, `${codePrefix}_offset`);
  const limit = readCount(query, 'limit', 20, `${codePrefix}_limit`);
  return { results: items.slice(offset, offset + limit), offset, limit, total: items.length };
}

/** A comma-separated query parameter as a list, or null when absent. */
export function listParam(query: URLSearchParams, name: string): string[] | null {
  const text = query.get(name);
  if (text === null || text === '' || text === '*') return null;
  return text.split(',').map((part) => part.trim()).filter(Boolean);
}
