export { listSpecies } from './list-species.js';
export { speciesById } from './species-by-id.js';
export { speciesHardness } from './species-hardness.js';
export type { HardnessReading, HardnessUnit, HardnessCondition } from './species-hardness.js';
export { MOISTURE_SOURCE, SPECIES_TABLE, STRENGTH_SOURCE } from './species-table.js';
export type { BotanicalGroup, GreenAndDry, GreenMoisture, SpeciesRecord } from './species-table.js';
