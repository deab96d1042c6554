import { conditionById, eventName, grindById, speciesName, type SearchFacet } from '@endgrain/shared';

const KINDS: Record<string, string> = { FINDING: 'Finding', GUIDE: 'Guide', SAFETY_NOTE: 'Safety note', AXE: 'Rack axe' };

export const FACET_TITLES: Record<SearchFacet, string> = { kind: 'Kind', species: 'Species', grind: 'Grind', event: 'Event', condition: 'Block condition' };

/** A facet value as people say it: "quaking aspen", not "quaking-aspen". */
export function facetValueLabel(facet: SearchFacet, value: string): string {
  switch (facet) {
    case 'kind':
      return KINDS[value] ?? value;
    case 'species':
      return speciesName(value) ?? value;
    case 'grind':
      return grindById(value)?.label ?? value;
    case 'event':
      return eventName(value) ?? value;
    case 'condition':
      return conditionById(value)?.label ?? value;
    default: {
      const unreachable: never = facet;
      return unreachable;
    }
  }
}
