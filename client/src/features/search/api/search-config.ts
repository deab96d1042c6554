/** What GET /api/search/config answers: where to point the SDK, the search-only key, the index. */
export interface SearchConfig {
  url: string;
  searchKey: string;
  indexUid: string;
}

export async function fetchSearchConfig(): Promise<SearchConfig> {
  const response = await fetch('/api/search/config');
  const body = (await response.json().catch(() => null)) as (SearchConfig & { message?: string }) | null;
  if (!response.ok || !body?.searchKey) throw new Error(body?.message ?? 'Search is not available right now.');
  return body;
}
