import { SPECIES_TABLE, type SpeciesRecord } from './species-table.js';

const BY_ID = new Map(SPECIES_TABLE.map((record) => [record.id, record]));

/** The species' published record, or undefined for an id the table does not hold. */
export function speciesById(id: string): SpeciesRecord | undefined {
  return BY_ID.get(id);
}
