import { randomUUID } from 'node:crypto';

import { DEMO_MEETS } from '@endgrain/seeds';
import { checkEntry, drawOrder } from '@endgrain/shared';
import type { EntityManager } from 'typeorm';

import { AthleteEntity } from '../league/entities/athlete.entity.js';
import { ClubEntity } from '../league/entities/club.entity.js';
import { SeasonEntity } from '../league/entities/season.entity.js';
import { EntryAthleteEntity } from '../meets/entities/entry-athlete.entity.js';
import { EntryEntity } from '../meets/entities/entry.entity.js';
import { EventTypeEntity } from '../meets/entities/event-type.entity.js';
import { MeetEventEntity } from '../meets/entities/meet-event.entity.js';
import { MeetEntity } from '../meets/entities/meet.entity.js';

/**
 * The demo season's meets with entries from every club. Entries are picked with the same
 * rules a coach's entry passes (checkEntry), so the demo never holds an entry the API refuses.
 */
export async function seedMeets(m: EntityManager, clubKeys: Map<string, string>): Promise<void> {
  const season = await m.getRepository(SeasonEntity).findOneByOrFail({ isCurrent: true });
  const types = new Map((await m.getRepository(EventTypeEntity).find()).map((t) => [t.code, t]));
  const clubs = await m.getRepository(ClubEntity).find({ order: { name: 'ASC' } });
  const athletes = await m.getRepository(AthleteEntity).find({ order: { lastName: 'ASC', firstName: 'ASC' } });
  for (const demo of DEMO_MEETS) {
    const meetId = randomUUID();
    await m.getRepository(MeetEntity).insert({
      id: meetId, seasonId: season.id, hostClubId: clubKeys.get(demo.hostClubKey)!, name: demo.name, startsOn: demo.startsOn,
      venue: demo.venue, entryDeadline: new Date(demo.entryDeadline), divisions: ['MENS', 'WOMENS', 'MIXED'],
      scoringScheme: demo.scoringScheme, pointsTable: demo.pointsTable, bestEntryPerClub: demo.bestEntryPerClub,
      minimumOnePoint: demo.minimumOnePoint, runOffTopPlaces: 0, maxEventsPerAthlete: 4, requireMixedPairs: true,
      status: demo.status, createdBy: null,
    });
    const perAthlete = new Map<string, number>();
    for (const [position, ev] of demo.events.entries()) {
      const type = types.get(ev.code)!;
      const meetEventId = randomUUID();
      await m.getRepository(MeetEventEntity).insert({
        id: meetEventId, meetId, eventTypeId: type.id, division: ev.division, speciesId: ev.speciesId, diameterMm: ev.diameterMm,
        timeLimitHundredths: null, weight: ev.weight ?? 1, scoringScheme: null, pointsTable: null, notes: '', position: position + 1,
        heatSize: null, drawSeed: null,
      });
      if (!demo.withEntries) continue;
      const inEvent = new Set<string>();
      const entryIds: { id: string }[] = [];
      for (const club of clubs) {
        const roster = athletes.filter((a) => a.clubId === club.id);
        const pick = pickUnit(roster, type.teamSize, (unit) =>
          checkEntry(unit.map((a) => ({ id: a.id, name: a.firstName, clubId: a.clubId, divisions: a.divisions })), {
            clubId: club.id, division: ev.division, eventName: type.name, teamSize: type.teamSize,
            requireMixedPair: Boolean(type.mixedPair), maxEventsPerAthlete: 4, alreadyInEvent: inEvent, eventsPerAthlete: perAthlete,
          }).length === 0,
        );
        if (!pick) continue;
        const entryId = randomUUID();
        entryIds.push({ id: entryId });
        await m.getRepository(EntryEntity).insert({ id: entryId, meetEventId, clubId: club.id, enteredBy: null, drawPosition: null, heat: null });
        await m.getRepository(EntryAthleteEntity).insert(pick.map((a, i) => ({ entryId, athleteId: a.id, meetEventId, position: i + 1 })));
        for (const a of pick) {
          inEvent.add(a.id);
          perAthlete.set(a.id, (perAthlete.get(a.id) ?? 0) + 1);
        }
      }
      if (demo.status === 'CLOSED') {
        const seed = 1000 + position;
        for (const slot of drawOrder(entryIds, seed, 2)) {
          await m.getRepository(EntryEntity).update({ id: slot.item.id }, { drawPosition: slot.order, heat: slot.heat });
        }
        await m.getRepository(MeetEventEntity).update({ id: meetEventId }, { drawSeed: seed, heatSize: 2 });
      }
    }
  }
}

/** The first unit (single, pair or team) from the roster that passes the entry rules. */
function pickUnit(roster: AthleteEntity[], size: number, ok: (unit: AthleteEntity[]) => boolean): AthleteEntity[] | null {
  if (size === 1) return roster.map((a) => [a]).find(ok) ?? null;
  if (size === 2) {
    for (let i = 0; i < roster.length; i += 1) {
      for (let j = i + 1; j < roster.length; j += 1) if (ok([roster[i]!, roster[j]!])) return [roster[i]!, roster[j]!];
    }
    return null;
  }
  const unit = roster.slice(0, size);
  return unit.length === size && ok(unit) ? unit : null;
}
