import { describe, expect, it } from '@jest/globals';

import { exportHref, readExplorerParams, writeExplorerParams } from './explorer-params.js';

describe('explorer address', () => {
  it('reads filters, sort and page from the address', () => {
    const state = readExplorerParams(new URLSearchParams('club=c1&division=mens&grind=convex&bmin=30&bmax=34&dmin=304.8&sort=points&dir=desc&page=2&size=50&finished=1'));
    expect(state).toEqual({
      filter: { clubId: 'c1', division: 'MENS', grind: 'CONVEX', bevelMinDeg: 30, bevelMaxDeg: 34, diameterMinMm: 304.8, finishedOnly: true },
      sort: { field: 'POINTS', direction: 'DESC' },
      page: 2,
      pageSize: 50,
    });
  });

  it('ignores values it does not know and falls back to the fastest times first', () => {
    expect(readExplorerParams(new URLSearchParams('division=coed&grind=round&size=7&page=-3'))).toEqual({
      filter: {}, sort: { field: 'TIME', direction: 'ASC' }, page: 0, pageSize: 25,
    });
  });

  it('writes back the same address it reads', () => {
    const text = 'season=s1&species=red-alder&dmin=254&condition=green&sort=date&dir=desc';
    expect(writeExplorerParams(readExplorerParams(new URLSearchParams(text))).toString()).toBe(text);
  });

  it("builds the export link with the server's parameter names", () => {
    expect(exportHref({ filter: { clubId: 'c1', grind: 'CHISEL' }, sort: { field: 'TIME', direction: 'ASC' } })).toBe('/api/results.csv?clubId=c1&grind=CHISEL&sort=TIME&direction=ASC');
  });
});
