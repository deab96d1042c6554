import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { canManageClub, canRunMeets, checkEntry } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { LeagueRepository } from '../league/league.repository.js';
import type { EnterMeetEventInput } from './dto/meet.inputs.js';
import { EntryAthleteEntity } from './entities/entry-athlete.entity.js';
import { EntryEntity } from './entities/entry.entity.js';
import { entriesOpen, toEntryModel } from './meets.mappers.js';
import { MeetsRepository } from './meets.repository.js';
import type { EntryModel } from './models/meet.model.js';

@Injectable()
export class EntriesService {
  constructor(
    @Inject(MeetsRepository) private readonly repo: MeetsRepository,
    @Inject(LeagueRepository) private readonly league: LeagueRepository,
  ) {}

  async enter(actor: AuthUser, input: EnterMeetEventInput, now = new Date()): Promise<EntryModel> {
    if (!canManageClub(actor, input.clubId)) throw DomainError.forbidden("Only this club's coaches can enter its athletes.");
    const event = await this.repo.findMeetEvent(input.meetEventId);
    if (!event) throw DomainError.notFound('That meet event');
    const meet = event.meet;
    if (!entriesOpen(meet, now) && !canRunMeets(actor)) {
      throw DomainError.badInput(
        'meetEventId',
        meet.status === 'OPEN' ? 'The entry deadline has passed; ask the organiser.' : 'This meet is not taking entries.',
      );
    }
    const athletes = await this.league.athletesByIds(input.athleteIds ?? []);
    if (athletes.length !== new Set(input.athleteIds).size) throw DomainError.badInput('athleteIds', 'One of the athletes was not found.');
    const byId = new Map(athletes.map((a) => [a.id, a]));
    const ordered = input.athleteIds.map((id) => byId.get(id)!);
    const problems = checkEntry(
      ordered.map((a) => ({ id: a.id, name: `${a.firstName} ${a.lastName}`, clubId: a.clubId, divisions: a.divisions })),
      {
        clubId: input.clubId,
        division: event.division,
        eventName: event.eventType.name,
        teamSize: event.eventType.teamSize,
        requireMixedPair: Boolean(event.eventType.mixedPair) && Boolean(meet.requireMixedPairs),
        maxEventsPerAthlete: meet.maxEventsPerAthlete,
        alreadyInEvent: await this.repo.athletesInEvent(event.id),
        eventsPerAthlete: await this.repo.eventsPerAthlete(meet.id),
      },
    );
    if (problems.length) throw DomainError.badInput('athleteIds', problems.map((p) => p.message).join(' '));
    const id = randomUUID();
    await this.repo.db.transaction(async (m) => {
      await m.getRepository(EntryEntity).insert({ id, meetEventId: event.id, clubId: input.clubId, enteredBy: actor.id, drawPosition: null, heat: null });
      await m.getRepository(EntryAthleteEntity).insert(
        ordered.map((a, i) => ({ entryId: id, athleteId: a.id, meetEventId: event.id, position: i + 1 })),
      );
    });
    const entry = (await this.repo.entriesOfMeet(meet.id)).find((e) => e.id === id)!;
    return toEntryModel(entry);
  }

  async withdraw(actor: AuthUser, entryId: string, now = new Date()): Promise<boolean> {
    const entry = await this.repo.entries.findOne({ where: { id: entryId }, relations: { meetEvent: { meet: true } } });
    if (!entry) throw DomainError.notFound('That entry');
    const organiser = canRunMeets(actor);
    if (!organiser && !canManageClub(actor, entry.clubId)) throw DomainError.forbidden("Only this club's coaches can withdraw its entries.");
    const meet = entry.meetEvent.meet;
    if (!organiser && !entriesOpen(meet, now)) throw DomainError.badInput('entryId', 'Entries are closed; ask the organiser to withdraw it.');
    if (meet.status === 'RUNNING' || meet.status === 'PUBLISHED') throw DomainError.badInput('entryId', 'The meet is under way: record a scratch instead of withdrawing.');
    await this.repo.entries.delete({ id: entryId });
    return true;
  }
}
