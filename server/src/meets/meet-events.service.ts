import { randomInt, randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { drawOrder } from '@endgrain/shared';

import { DomainError } from '../common/errors/domain-error.js';
import type { DrawOrderInput, MeetEventInput } from './dto/meet.inputs.js';
import { EntryEntity } from './entities/entry.entity.js';
import { MeetEventEntity } from './entities/meet-event.entity.js';
import { toMeetEventModel } from './meets.mappers.js';
import { MeetsRepository } from './meets.repository.js';
import { diameterMm, pointsTable, positiveInt, species, weight } from './meet.validation.js';
import type { MeetEventModel } from './models/meet.model.js';

const EDITABLE = ['DRAFT', 'OPEN', 'CLOSED'];

@Injectable()
export class MeetEventsService {
  constructor(@Inject(MeetsRepository) private readonly repo: MeetsRepository) {}

  async add(meetId: string, input: MeetEventInput): Promise<MeetEventModel> {
    const meet = await this.repo.findMeet(meetId);
    if (!meet) throw DomainError.notFound('That meet');
    if (!EDITABLE.includes(meet.status)) throw DomainError.badInput('meetId', 'Events can be added until the meet is under way.');
    if (!meet.divisions.includes(input.division)) {
      throw DomainError.badInput('division', 'That division is not part of this meet; add it to the meet first.');
    }
    const values = await this.values(input);
    const duplicate = (await this.repo.eventsOf(meetId)).find((e) => e.eventTypeId === values.eventTypeId && e.division === input.division);
    if (duplicate) throw DomainError.badInput('eventTypeId', `This meet already has ${duplicate.eventType.name} in that division.`);
    const position = (await this.repo.meetEvents.count({ where: { meetId } })) + 1;
    const id = randomUUID();
    await this.repo.meetEvents.insert({ id, meetId, position, heatSize: null, drawSeed: null, ...values });
    return this.model(id);
  }

  async update(id: string, input: MeetEventInput): Promise<MeetEventModel> {
    const event = await this.mustFind(id);
    if (!EDITABLE.includes(event.meet.status)) throw DomainError.badInput('meetEventId', 'Events can be changed until the meet is under way.');
    if (input.eventTypeId !== event.eventTypeId && (await this.repo.entries.count({ where: { meetEventId: id } })) > 0) {
      throw DomainError.badInput('eventTypeId', 'This event has entries; remove them before changing the event type.');
    }
    await this.repo.meetEvents.update({ id }, await this.values(input));
    return this.model(id);
  }

  async remove(id: string): Promise<boolean> {
    const event = await this.mustFind(id);
    if (!EDITABLE.includes(event.meet.status)) throw DomainError.badInput('meetEventId', 'Events cannot be removed once the meet is under way.');
    await this.repo.meetEvents.delete({ id });
    return true;
  }

  /** Draws order and heats from a seed (fresh, or a stored one to reproduce) and stores it. */
  async draw(input: DrawOrderInput): Promise<MeetEventModel> {
    const event = await this.mustFind(input.meetEventId);
    if (!['OPEN', 'CLOSED', 'RUNNING'].includes(event.meet.status)) throw DomainError.badInput('meetEventId', 'Draw the order once the meet takes entries.');
    const heatSize = positiveInt('heatSize', 'Heat size', input.heatSize, 50)!;
    const seed = input.seed ?? randomInt(1, 2 ** 31 - 1);
    if (!Number.isInteger(seed) || seed < 1 || seed >= 2 ** 32) throw DomainError.badInput('seed', 'A seed is a whole number from 1 to 4294967295.');
    const entries = await this.repo.entries.find({ where: { meetEventId: event.id }, select: { id: true } });
    if (entries.length === 0) throw DomainError.badInput('meetEventId', 'There are no entries to draw yet.');
    const slots = drawOrder(entries, seed, heatSize);
    await this.repo.db.transaction(async (m) => {
      for (const s of slots) await m.getRepository(EntryEntity).update({ id: s.item.id }, { drawPosition: s.order, heat: s.heat });
      await m.getRepository(MeetEventEntity).update({ id: event.id }, { drawSeed: seed, heatSize });
    });
    return this.model(event.id);
  }

  async model(id: string): Promise<MeetEventModel> {
    const event = await this.mustFind(id);
    const entries = await this.repo.entriesOfMeet(event.meetId);
    return toMeetEventModel(event, entries);
  }

  async mustFind(id: string): Promise<MeetEventEntity> {
    const event = await this.repo.findMeetEvent(id);
    if (!event) throw DomainError.notFound('That meet event');
    return event;
  }

  private async values(input: MeetEventInput) {
    const type = await this.repo.eventTypes.findOneBy({ id: input.eventTypeId });
    if (!type) throw DomainError.badInput('eventTypeId', 'Pick an event from the catalogue.');
    const scheme = input.scoringScheme ?? null;
    return {
      eventTypeId: type.id,
      division: input.division,
      speciesId: species('speciesId', input.speciesId),
      diameterMm: diameterMm('diameterMm', input.diameterMm ?? type.defaultDiameterMm?.[input.division] ?? null),
      timeLimitHundredths: positiveInt('timeLimitHundredths', 'Time limit', input.timeLimitHundredths, 360000),
      weight: weight('weight', input.weight ?? 1),
      scoringScheme: scheme,
      pointsTable: pointsTable('pointsTable', input.pointsTable, scheme === 'FIXED_TABLE'),
      notes: (input.notes ?? '').trim().slice(0, 400),
    };
  }
}
