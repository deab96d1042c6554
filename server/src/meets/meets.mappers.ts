import { speciesById } from '@endgrain/shared';

import { DivisionEnum } from '../league/models/league.enums.js';
import type { EntryEntity } from './entities/entry.entity.js';
import type { EventTypeEntity } from './entities/event-type.entity.js';
import type { MeetEventEntity } from './entities/meet-event.entity.js';
import type { MeetEntity } from './entities/meet.entity.js';
import type { EventTypeModel } from './models/event-type.model.js';
import type { EntryModel, MeetEventModel, MeetModel } from './models/meet.model.js';
import { MeetStatusEnum, ResultKindEnum, ScoringSchemeEnum } from './models/meets.enums.js';
import type { MeetCounts } from './meets.repository.js';

export function toEventTypeModel(t: EventTypeEntity): EventTypeModel {
  return {
    id: t.id,
    code: t.code,
    name: t.name,
    resultKind: ResultKindEnum[t.resultKind],
    teamSize: t.teamSize,
    mixedPair: Boolean(t.mixedPair),
    usesHead: Boolean(t.usesHead),
    defaultDiameters: Object.entries(t.defaultDiameterMm ?? {}).map(([division, diameterMm]) => ({ division, diameterMm: diameterMm ?? 0 })),
    defaultPenalties: t.defaultPenalties ?? [],
    description: t.description,
  };
}

export function entriesOpen(m: MeetEntity, now: Date): boolean {
  return m.status === 'OPEN' && m.entryDeadline.getTime() > now.getTime();
}

export function toMeetModel(m: MeetEntity, counts: MeetCounts | undefined, now: Date): MeetModel {
  return {
    id: m.id,
    seasonId: m.seasonId,
    seasonName: m.season?.name ?? '',
    hostClubId: m.hostClubId,
    hostClubName: m.hostClub?.name ?? '',
    name: m.name,
    startsOn: m.startsOn,
    venue: m.venue,
    entryDeadline: m.entryDeadline,
    divisions: m.divisions.map((d) => DivisionEnum[d]),
    scoringScheme: ScoringSchemeEnum[m.scoringScheme],
    pointsTable: m.pointsTable,
    bestEntryPerClub: Boolean(m.bestEntryPerClub),
    minimumOnePoint: Boolean(m.minimumOnePoint),
    runOffTopPlaces: m.runOffTopPlaces,
    maxEventsPerAthlete: m.maxEventsPerAthlete,
    requireMixedPairs: Boolean(m.requireMixedPairs),
    status: MeetStatusEnum[m.status],
    entriesOpen: entriesOpen(m, now),
    eventCount: counts?.events ?? 0,
    entryCount: counts?.entries ?? 0,
  };
}

export function toEntryModel(e: EntryEntity): EntryModel {
  const athletes = [...(e.athletes ?? [])]
    .sort((a, b) => a.position - b.position)
    .map((a) => ({ id: a.athleteId, name: a.athlete ? `${a.athlete.firstName} ${a.athlete.lastName}` : '' }));
  return {
    id: e.id,
    meetEventId: e.meetEventId,
    clubId: e.clubId,
    clubName: e.club?.name ?? '',
    clubShortName: e.club?.shortName ?? '',
    athletes,
    label: athletes.map((a) => a.name).join(' & '),
    drawPosition: e.drawPosition,
    heat: e.heat,
  };
}

export function toMeetEventModel(me: MeetEventEntity, entries: EntryEntity[]): MeetEventModel {
  return {
    id: me.id,
    meetId: me.meetId,
    eventType: toEventTypeModel(me.eventType),
    division: DivisionEnum[me.division],
    speciesId: me.speciesId,
    speciesName: me.speciesId ? (speciesById(me.speciesId)?.commonName ?? me.speciesId) : null,
    diameterMm: me.diameterMm,
    timeLimitHundredths: me.timeLimitHundredths,
    weight: me.weight,
    scoringScheme: me.scoringScheme ? ScoringSchemeEnum[me.scoringScheme] : null,
    pointsTable: me.pointsTable,
    notes: me.notes,
    position: me.position,
    heatSize: me.heatSize,
    drawSeed: me.drawSeed,
    entries: entries.filter((e) => e.meetEventId === me.id).map(toEntryModel),
  };
}
