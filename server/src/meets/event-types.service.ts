import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { EVENT_CATALOGUE } from '@endgrain/shared';
import type { DataSource } from 'typeorm';

import { EventTypeEntity } from './entities/event-type.entity.js';
import { toEventTypeModel } from './meets.mappers.js';
import { MeetsRepository } from './meets.repository.js';
import type { EventTypeModel } from './models/event-type.model.js';

@Injectable()
export class EventTypesService {
  constructor(@Inject(MeetsRepository) private readonly repo: MeetsRepository) {}

  async list(): Promise<EventTypeModel[]> {
    return (await this.repo.eventTypes.find({ order: { name: 'ASC' } })).map(toEventTypeModel);
  }
}

/** Adds any catalogue event the database lacks (by code); never overwrites an admin's edits. */
export async function ensureEventCatalogue(db: DataSource): Promise<number> {
  const repo = db.getRepository(EventTypeEntity);
  const known = new Set((await repo.find({ select: { code: true } })).map((t) => t.code));
  const missing = EVENT_CATALOGUE.filter((e) => !known.has(e.code));
  if (missing.length) await repo.insert(missing.map((e) => ({ id: randomUUID(), ...e })));
  return missing.length;
}
