/**
 * Reads a word from a sheet into one of a fixed set of values: case, spaces, hyphens,
 * underscores, slashes and apostrophes are ignored, so "Men's", "mens" and "MENS" agree.
 */
export function readChoice<T extends string>(text: string, spellings: Readonly<Record<string, T>>): T | undefined {
  return spellings[choiceKey(text)];
}

export function choiceKey(text: string): string {
  return text.trim().toLowerCase().replace(/[\s\-_/'’.]+/g, '');
}
