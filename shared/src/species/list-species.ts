import { SPECIES_TABLE, type BotanicalGroup, type SpeciesRecord } from './species-table.js';

/** Species in the table, sorted by common name, optionally of one botanical group. */
export function listSpecies(options: { group?: BotanicalGroup } = {}): SpeciesRecord[] {
  return SPECIES_TABLE.filter((record) => options.group === undefined || record.group === options.group).sort(
    (a, b) => a.commonName.localeCompare(b.commonName, 'en'),
  );
}
