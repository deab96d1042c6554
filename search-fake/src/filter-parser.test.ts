import { describe, expect, it } from '@jest/globals';

import { ApiError } from './api-error.js';
import { parseFilter } from './filter-parser.js';

// Expected trees are hand-worked from the grammar in the search contract.
describe('parseFilter', () => {
  it('reads a comparison with each operator', () => {
    for (const op of ['=', '!=', '>', '>=', '<', '<=']) {
      expect(parseFilter(`diameter ${op} 300`)).toEqual({ kind: 'compare', attribute: 'diameter', op, value: '300' });
    }
  });

  it('reads operators written without spaces', () => {
    expect(parseFilter('diameter>=300')).toEqual({ kind: 'compare', attribute: 'diameter', op: '>=', value: '300' });
  });

  it('binds AND tighter than OR', () => {
    expect(parseFilter('a = 1 OR b = 2 AND c = 3')).toEqual({
      kind: 'or',
      items: [
        { kind: 'compare', attribute: 'a', op: '=', value: '1' },
        { kind: 'and', items: [
          { kind: 'compare', attribute: 'b', op: '=', value: '2' },
          { kind: 'compare', attribute: 'c', op: '=', value: '3' },
        ] },
      ],
    });
  });

  it('lets parentheses override precedence and NOT nest', () => {
    expect(parseFilter('NOT (a = 1 OR b = 2)')).toEqual({
      kind: 'not',
      item: { kind: 'or', items: [
        { kind: 'compare', attribute: 'a', op: '=', value: '1' },
        { kind: 'compare', attribute: 'b', op: '=', value: '2' },
      ] },
    });
  });

  it('reads ranges, lists with a trailing comma, and EXISTS', () => {
    expect(parseFilter('diameter 250 TO 300')).toEqual({ kind: 'range', attribute: 'diameter', low: '250', high: '300' });
    expect(parseFilter("species IN [aspen, 'white pine',]")).toEqual({ kind: 'in', attribute: 'species', values: ['aspen', 'white pine'] });
    expect(parseFilter('species NOT IN [aspen]')).toEqual({ kind: 'not', item: { kind: 'in', attribute: 'species', values: ['aspen'] } });
    expect(parseFilter('grind NOT EXISTS')).toEqual({ kind: 'not', item: { kind: 'exists', attribute: 'grind' } });
  });

  it('takes quoted values with escapes, and keywords inside quotes as values', () => {
    expect(parseFilter('title = "the \\"keen\\" edge"')).toMatchObject({ value: 'the "keen" edge' });
    expect(parseFilter("label = 'AND'")).toMatchObject({ value: 'AND' });
  });

  it('treats lower-case keywords as plain words', () => {
    expect(parseFilter('condition = and')).toMatchObject({ value: 'and' });
  });

  it('points at the character where a filter goes wrong', () => {
    const cases: [string, string][] = [
      // hand-worked: columns are 1-based; the end of "species =" is column 10.
      ['species =', 'character 10'],
      ['species = poplar AND', 'character 21'],
      ['(species = poplar', 'character 18'],
      ['species poplar', 'character 15'],
      ['species IN aspen', 'character 12'],
      ["species = 'poplar", 'character 11'],
      ['species ~ poplar', 'character 9'],
      ['', 'empty'],
    ];
    for (const [expression, where] of cases) {
      let thrown: unknown;
      try {
        parseFilter(expression);
      } catch (error) {
        thrown = error;
      }
      expect(thrown).toBeInstanceOf(ApiError);
      expect((thrown as ApiError).code).toBe('invalid_search_filter');
      expect((thrown as ApiError).message).toContain(where);
    }
  });
});
