import { describe, expect, it } from '@jest/globals';

import { rejection, useTestFake } from '../testing/start-test-fake.js';

// Every check here goes through the official SDK, as the server and client will.
const t = useTestFake();

describe('settings', () => {
  const index = () => t().client.index('tuned');

  it('patches settings, reads them back, and resets one with null', async () => {
    await index().updateSettings({ filterableAttributes: ['species'], sortableAttributes: ['diameter'] }).waitTask();
    let settings = await index().getSettings();
    expect(settings.filterableAttributes).toEqual(['species']);
    expect(settings.sortableAttributes).toEqual(['diameter']);
    await index().updateSettings({ sortableAttributes: null }).waitTask();
    settings = await index().getSettings();
    expect(settings.sortableAttributes).toEqual([]);
    expect(settings.filterableAttributes).toEqual(['species']);
  });

  it('sets and resets single settings through their own routes', async () => {
    await index().updateFilterableAttributes(['grind', 'condition']).waitTask();
    await index().updateSearchableAttributes(['title', 'body']).waitTask();
    await index().updateSortableAttributes(['publishedAt']).waitTask();
    expect(await index().getFilterableAttributes()).toEqual(['grind', 'condition']);
    expect(await index().getSearchableAttributes()).toEqual(['title', 'body']);
    expect(await index().getSortableAttributes()).toEqual(['publishedAt']);
    await index().updateFilterableAttributes(null).waitTask();
    expect(await index().getFilterableAttributes()).toEqual([]);
  });

  it('refuses a setting of the wrong type at once with 400', async () => {
    const error = await rejection(index().updateSettings({ sortableAttributes: 'diameter' as unknown as string[] }));
    expect(error.response?.status).toBe(400);
    expect(error.cause?.code).toBe('invalid_settings_sortable_attributes');
  });
});

