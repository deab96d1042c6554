import { describe, expect, it } from '@jest/globals';

import { listSpecies } from './list-species.js';
import { speciesById } from './species-by-id.js';
import { speciesHardness } from './species-hardness.js';
import { SPECIES_TABLE } from './species-table.js';

// Check values: USDA FPL Wood Handbook, Chapter 5, Table 5-3 (5-3a metric, 5-3b inch-pound),
// and Chapter 4, Table 4-1 (2010) for green moisture content.

describe('species table', () => {
  it('holds fourteen species with unique kebab-case ids', () => {
    // Table 5-3 rows transcribed: fourteen species.
    const ids = SPECIES_TABLE.map((s) => s.id);
    expect(ids).toHaveLength(14);
    expect(new Set(ids).size).toBe(14);
    for (const id of ids) expect(id).toMatch(/^[a-z]+(-[a-z]+)*$/);
  });

  it('carries the published specific gravity and hardness of quaking aspen', () => {
    // Table 5-3: quaking aspen SG 0.35 / 0.38; hardness 300 / 350 lbf, 1,300 / 1,600 N.
    const aspen = speciesById('quaking-aspen');
    expect(aspen?.specificGravity).toEqual({ green: 0.35, dry12: 0.38 });
    expect(aspen?.hardnessLbf).toEqual({ green: 300, dry12: 350 });
    expect(aspen?.hardnessN).toEqual({ green: 1300, dry12: 1600 });
    expect(aspen?.source).toContain('Table 5-3');
  });

  it('carries other cells from the table', () => {
    // Table 5-3: sugar maple 970 / 1,450 lbf; northern red oak 5,700 N at 12 %; paper birch SG 0.48 / 0.55.
    expect(speciesById('sugar-maple')?.hardnessLbf).toEqual({ green: 970, dry12: 1450 });
    expect(speciesById('northern-red-oak')?.hardnessN.dry12).toBe(5700);
    expect(speciesById('paper-birch')?.specificGravity).toEqual({ green: 0.48, dry12: 0.55 });
  });

  it('files eastern white pine as the softwood', () => {
    // Trade and botanical fact: pines are conifers (softwoods); the rest of this list are broadleaves.
    expect(listSpecies({ group: 'softwood' }).map((s) => s.id)).toEqual(['eastern-white-pine']);
  });

  it('adds green moisture content where Table 4-1 gives it', () => {
    // Table 4-1 (2010): American basswood 81 / 133; red alder — / 97; aspen 95 / 113.
    expect(speciesById('american-basswood')?.greenMoisture).toMatchObject({ heartwood: 81, sapwood: 133 });
    expect(speciesById('red-alder')?.greenMoisture).toMatchObject({ heartwood: null, sapwood: 97 });
    expect(speciesById('bigtooth-aspen')?.greenMoisture).toMatchObject({ heartwood: 95, sapwood: 113 });
    expect(speciesById('sugar-maple')?.greenMoisture).toBeNull();
  });

  it('lists species alphabetically by common name', () => {
    const names = listSpecies().map((s) => s.commonName);
    expect(names[0]).toBe('American basswood');
    expect(names).toEqual([...names].sort((a, b) => a.localeCompare(b, 'en')));
  });

  it('returns undefined for an unknown id', () => {
    expect(speciesById('ironwood-of-atlantis')).toBeUndefined();
  });
});

describe('speciesHardness', () => {
  it('returns a printed value with its source', () => {
    // Table 5-3: yellow-poplar 2,400 N at 12 % moisture.
    expect(speciesHardness('yellow-poplar', 'dry12', 'N')).toMatchObject({ kind: 'published', value: 2400 });
  });

  it('says "no published value" for bigtooth aspen and balsam poplar', () => {
    // Table 5-3 prints no hardness for either species.
    for (const id of ['bigtooth-aspen', 'balsam-poplar']) {
      for (const unit of ['lbf', 'N'] as const) {
        const reading = speciesHardness(id, 'dry12', unit);
        expect(reading.kind).toBe('no-published-value');
        expect(reading).not.toHaveProperty('value');
      }
    }
  });

  it('leaves a blank newton cell blank even when the lbf cell is printed', () => {
    // Table 5-3: eastern cottonwood green hardness 340 lbf, newton cell "—".
    expect(speciesHardness('eastern-cottonwood', 'green', 'lbf')).toMatchObject({ kind: 'published', value: 340 });
    const reading = speciesHardness('eastern-cottonwood', 'green', 'N');
    expect(reading.kind).toBe('no-published-value');
    if (reading.kind === 'no-published-value') expect(reading.message).toMatch(/^No published value/);
  });

  it('refuses an unknown species instead of guessing', () => {
    expect(() => speciesHardness('mystery-wood', 'green', 'lbf')).toThrow(RangeError);
  });
});
