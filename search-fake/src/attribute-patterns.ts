/**
 * Whether an attribute is covered by a settings list: named exactly, matched by a `*`
 * pattern, or nested under a listed parent (`maker` covers `maker.town`).
 */
export function attributeAllowed(attribute: string, patterns: readonly string[]): boolean {
  return patterns.some((pattern) => {
    if (pattern === attribute || attribute.startsWith(`${pattern}.`)) return true;
    if (!pattern.includes('*')) return false;
    const escaped = pattern.split('*').map((part) => part.replace(/[.+?^${}()|[\]\\]/g, '\\$&'));
    return new RegExp(`^${escaped.join('.*')}$`).test(attribute);
  });
}

/** A readable list for error messages: "`a`, `b`" or "none". */
export function listForMessage(names: readonly string[]): string {
  return names.length === 0 ? 'none' : names.map((name) => `\`${name}\``).join(', ');
}
