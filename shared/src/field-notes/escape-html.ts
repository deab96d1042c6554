const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };
const UNESCAPES: Record<string, string> = Object.fromEntries(Object.entries(ESCAPES).map(([raw, escaped]) => [escaped, raw]));

/** Makes text safe anywhere in HTML (content and quoted attributes): the five special characters become entities. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ESCAPES[c] as string);
}

/** The exact inverse of `escapeHtml` (only its five entities), for reading a URL back out of escaped text. */
export function unescapeHtml(text: string): string {
  return text.replace(/&(?:amp|lt|gt|quot|#39);/g, (e) => UNESCAPES[e] as string);
}
