// Whitespace, controls, quotes, angle brackets, backslash and backtick never belong in a link we
// print: browsers strip or reinterpret them (e.g. "java\tscript:"), so any of them refuses the URL.
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const UNSAFE_CHARACTER = /[\u0000-\u0020\u007f-\u009f"'<>\\`]/u;
const SCHEME = /^([a-z][a-z0-9+.-]*):/i;
// Entity-shaped text ("&#106;", "&colon;") has no honest use in a link and is how schemes get smuggled.
const ENTITY_LIKE = /&(?:#|[a-z]+;)/i;
const LINK_SCHEMES = new Set(['http', 'https', 'mailto']);
// Uploaded pictures come from our own API only; no "..", no "//", letters, digits and - _ . / only.
const IMAGE_SOURCE = /^\/api\/[A-Za-z0-9_\-./]+$/;

/**
 * The link target if it is http(s), mailto or a same-site relative path; null otherwise
 * (javascript:, data:, vbscript:, protocol-relative "//host", or anything a browser could read as a scheme).
 */
export function safeLinkHref(url: string): string | null {
  if (url === '' || UNSAFE_CHARACTER.test(url) || ENTITY_LIKE.test(url)) return null;
  const scheme = SCHEME.exec(url);
  if (scheme) return LINK_SCHEMES.has((scheme[1] as string).toLowerCase()) ? url : null;
  if (url.startsWith('//')) return null;
  // No scheme by our reading, but a colon before the path would still look like one to someone.
  const head = url.split(/[/?#]/, 1)[0] ?? '';
  return head.includes(':') ? null : url;
}

/** The image source if it points at our own `/api/...` routes; null otherwise (data:, other sites, tricks). */
export function safeImageSrc(url: string): string | null {
  if (!IMAGE_SOURCE.test(url) || url.includes('..') || url.includes('//')) return null;
  return url;
}
