/** "quaking aspen" → "Quaking aspen": a label that starts a line, with the rest left as written. */
export function sentenceCase(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}
