import { afterEach, beforeEach, describe, expect, it, jest } from '@jest/globals';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { screen, waitFor, within } from '@testing-library/react';

import { renderWithProviders } from '../../../../test/render-with-providers.js';
import { SearchView } from './search-view.js';

// The SDK ships as ES modules only, which this CommonJS Jest cannot load (the server tests and the
// Chromium test drive the real SDK). This stand-in makes the SDK's search request: POST
// {host}/indexes/{uid}/search with the key as a bearer token and the parameters as the body.
jest.mock('meilisearch', () => ({
  Meilisearch: class {
    constructor(private readonly options: { host: string; apiKey: string }) {}
    index(uid: string) {
      return {
        search: async (q: string, params: Record<string, unknown>, init?: RequestInit) => {
          const response = await fetch(`${this.options.host}/indexes/${uid}/search`, {
            method: 'POST',
            headers: { 'content-type': 'application/json', authorization: `Bearer ${this.options.apiKey}` },
            body: JSON.stringify({ q, ...params }),
            signal: init?.signal,
          });
          const body = (await response.json()) as { message?: string };
          if (!response.ok) throw new Error(body.message);
          return body;
        },
      };
    }
  },
}));

const CONFIG = { url: '/api/search', searchKey: 'search-only-key', indexUid: 'endgrain-knowledge' };
const HIT = {
  id: 'article-1', kind: 'FINDING', slug: 'chisels-green-aspen', title: 'Chisels in green aspen', summary: 'On wet poplar, chisels cut deeper.',
  url: '/field-notes/chisels-green-aspen', species: ['quaking-aspen'], grind: ['CHISEL'], event: [], condition: ['GREEN'], evidence: [], authorName: 'Tamsin Oakridge', publishedAt: 0,
  // The service copies document text into highlights as it is: markup in it must stay text.
  _formatted: { title: 'Chisels in green \uE000aspen\uE001 <img src=x onerror=alert(1)>', summary: 'On wet \uE000poplar\uE001, chisels cut deeper.' },
};

type Call = { url: string; body: Record<string, unknown> | null; auth: string | null };
let calls: Call[];
let answer: (call: Call) => Response;
const json = (body: unknown, status = 200) => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });

beforeEach(() => {
  calls = [];
  answer = (call) =>
    call.url.endsWith('/api/search/config')
      ? json(CONFIG)
      : json({ hits: [HIT], query: call.body?.['q'], processingTimeMs: 1, limit: 20, offset: 0, estimatedTotalHits: 1, facetDistribution: { kind: { FINDING: 1 }, species: { 'quaking-aspen': 1 }, condition: { GREEN: 1 } } });
  globalThis.fetch = jest.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const url = typeof input === 'string' ? input : input instanceof URL ? input.toString() : input.url;
    const headers = new Headers(init?.headers);
    const call = { url, body: init?.body ? (JSON.parse(String(init.body)) as Record<string, unknown>) : null, auth: headers.get('authorization') };
    calls.push(call);
    return answer(call);
  }) as typeof fetch;
});
afterEach(() => {
  jest.restoreAllMocks();
});

function renderSearch(path = '/search') {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
  return renderWithProviders({ path, element: <QueryClientProvider client={client}><SearchView /></QueryClientProvider> });
}

describe('SearchView', () => {
  it('searches as you type with the search-only key, dropping the small words of a question', async () => {
    const { user } = renderSearch();
    await user.type(screen.getByRole('searchbox', { name: 'Search Field Notes' }), 'grind for wet poplr');
    await waitFor(() => expect(calls.some((c) => c.body?.['q'] === 'grind wet poplr')).toBe(true));
    const search = calls.find((c) => c.body?.['q'] === 'grind wet poplr')!;
    expect(search.url).toBe('http://localhost/api/search/indexes/endgrain-knowledge/search');
    expect(search.auth).toBe('Bearer search-only-key');
    expect(search.body).toMatchObject({ q: 'grind wet poplr', matchingStrategy: 'frequency', facets: ['kind', 'species', 'grind', 'event', 'condition'] });
  });

  it('marks the matched words and keeps markup in the text as text', async () => {
    const { container } = renderSearch('/search?q=aspen');
    const link = await screen.findByRole('link', { name: /Chisels in green aspen/ });
    expect(within(link).getByText('aspen').tagName).toBe('MARK');
    expect(link).toHaveTextContent('<img src=x onerror=alert(1)>');
    expect(container.querySelector('article img')).toBeNull();
  });

  it('links a finding to its Grain Map row and filters by a facet through the address', async () => {
    const { user, router } = renderSearch('/search?q=aspen');
    expect(await screen.findByRole('link', { name: 'See the Grain Map row for quaking aspen (Green / wet)' })).toHaveAttribute('href', '/grain-map?species=quaking-aspen&condition=GREEN');
    await user.click(screen.getByRole('checkbox', { name: 'quaking aspen (1)' }));
    expect(router.state.location.search).toBe('?q=aspen&species=quaking-aspen');
    await screen.findByRole('link', { name: /Chisels in green aspen/ });
    expect(calls.at(-1)?.body?.['filter']).toEqual([['species = "quaking-aspen"']]);
  });

  it('says when nothing matches and offers other words', async () => {
    answer = (call) => (call.url.endsWith('/config') ? json(CONFIG) : json({ hits: [], query: 'zz', processingTimeMs: 1, limit: 20, offset: 0, estimatedTotalHits: 0, facetDistribution: {} }));
    renderSearch('/search?q=zzqqxx');
    expect(await screen.findByText(/Nothing matches “zzqqxx”/)).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'grind for wet poplar' })).toBeInTheDocument();
  });

  it('says search is unavailable when the service is down, and offers a retry', async () => {
    answer = () => json({ code: 'SEARCH_UNAVAILABLE', message: 'Search is not available right now; try again in a minute.' }, 503);
    renderSearch('/search?q=aspen');
    // The config is asked for twice (one retry) before the page gives up.
    const alert = await screen.findByRole('alert', {}, { timeout: 5000 });
    expect(alert).toHaveTextContent('Search is not available right now');
    expect(within(alert).getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
