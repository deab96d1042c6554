import { randomUUID } from 'node:crypto';

import { Inject, Injectable } from '@nestjs/common';
import { canManageClub, canRunMeets, isMeetPublic, meetStatusProblem, type MeetStatus } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { LeagueRepository } from '../league/league.repository.js';
import { divisions, isoDate, text } from '../league/league.validation.js';
import type { MeetInput, MeetsFilter } from './dto/meet.inputs.js';
import { MeetChangeEntity } from './entities/meet-change.entity.js';
import { MeetEntity } from './entities/meet.entity.js';
import { toMeetEventModel, toMeetModel } from './meets.mappers.js';
import { MeetScoringHooks } from './meet-scoring-hooks.js';
import { MeetsRepository } from './meets.repository.js';
import { pointsTable, positiveInt } from './meet.validation.js';
import type { MeetChangeModel, MeetDetailModel, MeetModel } from './models/meet.model.js';

const SCORING_KEYS = ['scoringScheme', 'pointsTable', 'bestEntryPerClub', 'minimumOnePoint', 'runOffTopPlaces'] as const;

@Injectable()
export class MeetsService {
  constructor(
    @Inject(MeetsRepository) private readonly repo: MeetsRepository,
    @Inject(LeagueRepository) private readonly league: LeagueRepository,
    @Inject(MeetScoringHooks) private readonly scoringHooks: MeetScoringHooks,
  ) {}

  async list(actor: AuthUser | null, filter: MeetsFilter = {}, now = new Date()): Promise<MeetModel[]> {
    const today = now.toISOString().slice(0, 10);
    const visible = canRunMeets(actor) ? undefined : ['OPEN', 'CLOSED', 'RUNNING', 'PUBLISHED'];
    const statuses = filter.status ? [filter.status].filter((s) => !visible || visible.includes(s)) : visible;
    if (statuses && statuses.length === 0) return [];
    const meets = await this.repo.list({
      seasonId: filter.seasonId,
      statuses: statuses ?? (filter.when ? ['DRAFT', 'OPEN', 'CLOSED', 'RUNNING', 'PUBLISHED'] : undefined),
      fromDate: filter.when === 'UPCOMING' ? today : undefined,
      beforeDate: filter.when === 'PAST' ? today : undefined,
      clubId: filter.clubId,
    });
    const counts = await this.repo.counts(meets.map((m) => m.id));
    return meets.map((m) => toMeetModel(m, counts.get(m.id), now));
  }

  async detail(actor: AuthUser | null, id: string, now = new Date()): Promise<MeetDetailModel> {
    const meet = await this.visibleMeet(actor, id);
    const [events, entries, isTimekeeper] = await Promise.all([this.repo.eventsOf(id), this.repo.entriesOfMeet(id), actor ? this.repo.isTimekeeper(id, actor.id) : false]);
    const counts = { events: events.length, entries: entries.length };
    const clubIds = actor?.role === 'ADMIN' ? (await this.league.clubs.find({ select: { id: true } })).map((c) => c.id) : (actor?.clubIds ?? []).filter((c) => canManageClub(actor, c));
    return {
      ...toMeetModel(meet, counts, now),
      events: events.map((e) => toMeetEventModel(e, entries)),
      canManage: canRunMeets(actor),
      enterableClubIds: clubIds,
      isTimekeeper,
    };
  }

  async create(actor: AuthUser, input: MeetInput, now = new Date()): Promise<MeetDetailModel> {
    const values = await this.meetValues(input);
    const id = randomUUID();
    await this.repo.meets.insert({ id, ...values, status: 'DRAFT', createdBy: actor.id });
    return this.detail(actor, id, now);
  }

  async update(actor: AuthUser, id: string, input: MeetInput, now = new Date()): Promise<MeetDetailModel> {
    const meet = await this.mustFind(id);
    if (meet.status === 'ARCHIVED') throw DomainError.badInput('status', 'An archived meet cannot be edited.');
    const values = await this.meetValues(input);
    const scoringChanged = SCORING_KEYS.some((k) => JSON.stringify(meet[k]) !== JSON.stringify(values[k]));
    const recorded = meet.status === 'RUNNING' || meet.status === 'PUBLISHED';
    if (recorded && scoringChanged && !(input.reason ?? '').trim()) {
      throw DomainError.badInput('reason', 'This meet has results: say why the scoring changes, so the change is on record.');
    }
    await this.repo.db.transaction(async (m) => {
      await m.getRepository(MeetEntity).update({ id }, values);
      if (recorded && scoringChanged) {
        const reason = text('reason', 'Reason', input.reason, 3, 180);
        const pick = (src: Record<string, unknown>): Record<string, never> => Object.fromEntries(SCORING_KEYS.map((k) => [k, src[k]])) as Record<string, never>;
        await m.getRepository(MeetChangeEntity).insert({
          id: randomUUID(),
          meetId: id,
          userId: actor.id,
          summary: `Scoring changed: ${reason}`,
          before: pick(meet as unknown as Record<string, unknown>),
          after: pick(values as unknown as Record<string, unknown>),
        });
        // Places, points and standings follow the new scoring in the same transaction.
        await this.scoringHooks.scoringChanged(m, id, { userId: actor.id, reason });
      }
    });
    return this.detail(actor, id, now);
  }

  async setStatus(actor: AuthUser, id: string, status: MeetStatus, now = new Date()): Promise<MeetDetailModel> {
    const meet = await this.mustFind(id);
    const problem = meetStatusProblem(meet.status, status);
    if (problem) throw DomainError.badInput('status', problem);
    if (status === 'OPEN') {
      const events = await this.repo.eventsOf(id);
      if (events.length === 0) throw DomainError.badInput('status', 'Add at least one event before opening the meet for entries.');
    }
    await this.repo.meets.update({ id }, { status });
    return this.detail(actor, id, now);
  }

  async remove(id: string): Promise<boolean> {
    const meet = await this.mustFind(id);
    if (meet.status === 'RUNNING' || meet.status === 'PUBLISHED') {
      throw DomainError.badInput('status', 'A meet with results cannot be deleted; archive it instead.');
    }
    await this.repo.meets.delete({ id });
    return true;
  }

  async changes(id: string): Promise<MeetChangeModel[]> {
    await this.mustFind(id);
    const rows = await this.repo.changes.find({ where: { meetId: id }, order: { createdAt: 'DESC' } });
    const names = await this.repo.userNames(rows.map((r) => r.userId).filter((u): u is string => u !== null));
    return rows.map((r) => ({
      id: r.id, summary: r.summary, byUserId: r.userId, byName: r.userId ? (names.get(r.userId) ?? null) : null,
      at: r.createdAt, before: JSON.stringify(r.before), after: JSON.stringify(r.after),
    }));
  }

  async mustFind(id: string): Promise<MeetEntity> {
    const meet = await this.repo.findMeet(id);
    if (!meet) throw DomainError.notFound('That meet');
    return meet;
  }

  private async visibleMeet(actor: AuthUser | null, id: string): Promise<MeetEntity> {
    const meet = await this.repo.findMeet(id);
    if (!meet || (!isMeetPublic(meet.status) && !canRunMeets(actor))) throw DomainError.notFound('That meet');
    return meet;
  }

  private async meetValues(input: MeetInput) {
    if (!(await this.league.seasons.findOneBy({ id: input.seasonId }))) throw DomainError.badInput('seasonId', 'Pick a season.');
    if (!(await this.league.clubs.findOneBy({ id: input.hostClubId }))) throw DomainError.badInput('hostClubId', 'Pick the host club.');
    const startsOn = isoDate('startsOn', 'Meet date', input.startsOn);
    const deadline = input.entryDeadline instanceof Date ? input.entryDeadline : new Date(input.entryDeadline);
    if (Number.isNaN(deadline.getTime())) throw DomainError.badInput('entryDeadline', 'Entry deadline must be a date and time.');
    if (deadline.toISOString().slice(0, 10) > startsOn) throw DomainError.badInput('entryDeadline', 'Entries must close on or before the meet day.');
    const runOff = input.runOffTopPlaces ?? 0;
    if (!Number.isInteger(runOff) || runOff < 0 || runOff > 10) throw DomainError.badInput('runOffTopPlaces', 'Run-off places must be a whole number from 0 to 10.');
    return {
      name: text('name', 'Meet name', input.name, 3, 120),
      seasonId: input.seasonId,
      hostClubId: input.hostClubId,
      startsOn,
      venue: text('venue', 'Venue', input.venue, 2, 160),
      entryDeadline: deadline,
      divisions: divisions('divisions', input.divisions),
      scoringScheme: input.scoringScheme,
      pointsTable: pointsTable('pointsTable', input.pointsTable, input.scoringScheme === 'FIXED_TABLE'),
      bestEntryPerClub: input.bestEntryPerClub ?? false,
      minimumOnePoint: input.minimumOnePoint ?? false,
      runOffTopPlaces: runOff,
      maxEventsPerAthlete: positiveInt('maxEventsPerAthlete', 'Events per athlete', input.maxEventsPerAthlete, 30),
      requireMixedPairs: input.requireMixedPairs ?? true,
    };
  }
}
