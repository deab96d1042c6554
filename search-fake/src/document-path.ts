export type Doc = Record<string, unknown>;

function isPlainObject(value: unknown): value is Doc {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/**
 * Every leaf value at a dotted path, arrays flattened, so `tags` or `maker.town`
 * read the same whether the field holds one value, a list, or a list of objects.
 */
export function valuesAt(doc: Doc, path: string): unknown[] {
  const direct = doc[path];
  if (direct !== undefined || !path.includes('.')) return flatten(direct);
  let current: unknown[] = [doc];
  for (const segment of path.split('.')) {
    const next: unknown[] = [];
    for (const value of current) {
      for (const item of flatten(value)) {
        if (isPlainObject(item) && item[segment] !== undefined) next.push(item[segment]);
      }
    }
    if (next.length === 0) return [];
    current = next;
  }
  return current.flatMap(flatten);
}

function flatten(value: unknown): unknown[] {
  if (value === undefined) return [];
  if (!Array.isArray(value)) return [value];
  return value.flatMap(flatten);
}

/** Whether the document has the path at all (a `null` value counts as present). */
export function hasPath(doc: Doc, path: string): boolean {
  if (path in doc) return true;
  if (!path.includes('.')) return false;
  const [head, ...rest] = path.split('.');
  const child = doc[head as string];
  const items = Array.isArray(child) ? child : [child];
  return items.some((item) => isPlainObject(item) && hasPath(item, rest.join('.')));
}

/** Dotted paths of the string leaves, in the order they first appear in the document. */
export function stringPaths(doc: Doc, prefix = '', out: string[] = []): string[] {
  for (const [key, value] of Object.entries(doc)) {
    const path = prefix === '' ? key : `${prefix}.${key}`;
    for (const item of flatten(value)) {
      if (typeof item === 'string') {
        if (!out.includes(path)) out.push(path);
      } else if (isPlainObject(item)) {
        stringPaths(item, path, out);
      }
    }
  }
  return out;
}

/** Keeps only the named top-level attributes; `*` keeps everything. */
export function pickAttributes(doc: Doc, attributes: readonly string[] | null): Doc {
  if (attributes === null || attributes.includes('*')) return { ...doc };
  const out: Doc = {};
  for (const name of attributes) {
    const top = name.split('.')[0] as string;
    if (top in doc) out[top] = doc[top];
  }
  return out;
}
