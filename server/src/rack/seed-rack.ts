import { randomUUID } from 'node:crypto';

import type { DataSource, EntityManager } from 'typeorm';

import { ClubEntity } from '../league/entities/club.entity.js';
import { AxeServiceEntity, type SetupChange } from './entities/axe-service.entity.js';
import { AxeEntity } from './entities/axe.entity.js';
import { DEMO_RACKS, type SeedAxe } from './seed-rack-data.js';

/**
 * Writes the demo racks (a few axes per demo club, with service history) to the clubs found by
 * short name; given `only` (demo short name → club id), to just those clubs. A club that already
 * has axes is left alone; answers how many axes were added.
 */
export async function seedRack(db: DataSource | EntityManager, only?: Record<string, string>): Promise<number> {
  let added = 0;
  for (const [shortName, axes] of Object.entries(DEMO_RACKS)) {
    const clubId = only ? only[shortName] : (await db.getRepository(ClubEntity).findOneBy({ shortName }))?.id;
    if (!clubId || (await db.getRepository(AxeEntity).countBy({ clubId })) > 0) continue;
    for (const seed of axes) {
      await insertAxe(db, clubId, seed);
      added += 1;
    }
  }
  return added;
}

async function insertAxe(db: DataSource | EntityManager, clubId: string, { services, ...values }: SeedAxe): Promise<void> {
  const id = randomUUID();
  await db.getRepository(AxeEntity).insert({ id, clubId, ...values, createdBy: null });
  for (const s of services) {
    const changes: SetupChange[] = Object.entries(s.before ?? {}).map(([field, before]) => ({ field, before, after: values[field as keyof typeof values] as SetupChange['after'] }));
    await db.getRepository(AxeServiceEntity).insert({ id: randomUUID(), axeId: id, kind: s.kind, doneOn: s.doneOn, doneBy: s.doneBy, loggedBy: null, notes: s.notes, changes });
  }
}
