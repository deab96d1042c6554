import { Inject, Injectable } from '@nestjs/common';
import { canRunMeets, isMeetPublic, speciesById } from '@endgrain/shared';

import type { AuthUser } from '../common/auth/auth-user.js';
import { DomainError } from '../common/errors/domain-error.js';
import { text } from '../league/league.validation.js';
import { DivisionEnum } from '../league/models/league.enums.js';
import type { EntryEntity } from '../meets/entities/entry.entity.js';
import type { MeetEventEntity } from '../meets/entities/meet-event.entity.js';
import type { MeetEntity } from '../meets/entities/meet.entity.js';
import { toEntryModel } from '../meets/meets.mappers.js';
import { MeetsRepository } from '../meets/meets.repository.js';
import { POST_REFUSAL, TimekeepersService } from '../meets/timekeepers.service.js';
import { MeetStatusEnum, ResultKindEnum } from '../meets/models/meets.enums.js';
import type { CorrectResultInput, RecordResultInput } from './dto/result.inputs.js';
import type { MeetEventResultsModel, MeetResultsModel, ResultModel } from './models/result.model.js';
import { postedFromInput } from './posted-from-input.js';
import { ResultHydrator } from './result-hydrator.js';
import { ResultsReadRepository, VISIBLE_STATUSES } from './results-read.repository.js';
import { ResultsWriter } from './results-writer.js';
import { ResultsRepository } from './results.repository.js';

const RECORDING = ['CLOSED', 'RUNNING'];
const CORRECTING = ['CLOSED', 'RUNNING', 'PUBLISHED'];
const UNPLACED_ORDER = { FINISHED: 0, DID_NOT_FINISH: 1, DISQUALIFIED: 2, SCRATCH: 3 } as const;

export const resultsVisible = (meet: Pick<MeetEntity, 'status'>): boolean => (VISIBLE_STATUSES as readonly string[]).includes(meet.status);

/** Posting and correcting results, and a meet's results page. */
@Injectable()
export class ResultsService {
  constructor(
    @Inject(MeetsRepository) private readonly meetsRepo: MeetsRepository,
    @Inject(ResultsRepository) private readonly repo: ResultsRepository,
    @Inject(ResultsReadRepository) private readonly read: ResultsReadRepository,
    @Inject(ResultsWriter) private readonly writer: ResultsWriter,
    @Inject(ResultHydrator) private readonly hydrator: ResultHydrator,
    @Inject(TimekeepersService) private readonly timekeepers: TimekeepersService,
  ) {}

  record(actor: AuthUser, input: RecordResultInput): Promise<MeetEventResultsModel> {
    return this.save(actor, input, null);
  }

  correct(actor: AuthUser, input: CorrectResultInput): Promise<MeetEventResultsModel> {
    return this.save(actor, input, text('correctionReason', 'The reason for the correction', input.correctionReason, 3, 300));
  }

  private async save(actor: AuthUser, input: RecordResultInput, correction: string | null): Promise<MeetEventResultsModel> {
    const entry = await this.meetsRepo.entries.findOne({ where: { id: input.entryId }, relations: { meetEvent: { eventType: true, meet: true } } });
    if (!entry) throw DomainError.notFound('That entry');
    const event = entry.meetEvent;
    if (!(await this.timekeepers.canPost(actor, event.meetId))) throw DomainError.forbidden(POST_REFUSAL);
    // With no axe picked and no head typed, the axe the coach gave this entry in the lineup is used.
    const typedHead = input.grind != null || input.bevelIncludedDeg != null || input.chiselWidthMm != null;
    const axeId = input.axeId ?? (typedHead ? null : await this.read.lineupAxeId(input.entryId));
    const axe = axeId ? await this.read.axeSetup(axeId) : null;
    if (input.axeId && !axe) throw DomainError.badInput('axeId', 'That axe is not in the rack.');
    const posted = postedFromInput(input, {
      kind: event.eventType.resultKind, eventName: event.eventType.name, clubId: entry.clubId,
      speciesId: event.speciesId, diameterMm: event.diameterMm, axe,
    });
    await this.repo.db.transaction(async (m) => {
      const meet = await this.repo.lockMeet(m, event.meetId);
      if (!meet) throw DomainError.notFound('That meet');
      checkStatus(meet, correction !== null);
      await this.writer.write(m, meet, [{ entry, posted }], { userId: actor.id, action: correction ? 'CORRECTED' : 'RECORDED', reason: correction });
    });
    return this.eventResults(event, await this.meetsRepo.entriesOfMeet(event.meetId));
  }

  async meetResults(actor: AuthUser | null, meetId: string): Promise<MeetResultsModel> {
    const meet = await this.meetsRepo.findMeet(meetId);
    const organiser = canRunMeets(actor);
    if (!meet || (!isMeetPublic(meet.status) && !organiser)) throw DomainError.notFound('That meet');
    const published = resultsVisible(meet);
    // A timekeeper sees the meet's results as they are posted, and posts them until they are published.
    const timekeeper = !organiser && (await this.timekeepers.isTimekeeper(actor, meetId));
    const events = published || organiser || timekeeper ? await this.meetsRepo.eventsOf(meetId) : [];
    const entries = events.length ? await this.meetsRepo.entriesOfMeet(meetId) : [];
    const results = events.length ? await this.hydrator.models(await this.read.resultsOfMeet(meetId)) : [];
    return {
      meetId: meet.id,
      meetName: meet.name,
      startsOn: meet.startsOn,
      venue: meet.venue,
      seasonId: meet.seasonId,
      seasonName: meet.season?.name ?? '',
      status: MeetStatusEnum[meet.status],
      published,
      canRecord: (organiser && CORRECTING.includes(meet.status)) || (timekeeper && RECORDING.includes(meet.status)),
      canPublish: organiser,
      asTimekeeper: timekeeper,
      events: events.map((e) => this.eventModel(e, entries, results)),
    };
  }

  private async eventResults(event: MeetEventEntity, entries: EntryEntity[]): Promise<MeetEventResultsModel> {
    const rows = await this.read.resultsOfMeet(event.meetId);
    return this.eventModel(event, entries, await this.hydrator.models(rows.filter((r) => r.meetEventId === event.id)));
  }

  private eventModel(event: MeetEventEntity, entries: EntryEntity[], results: ResultModel[]): MeetEventResultsModel {
    const mine = results.filter((r) => r.meetEventId === event.id).sort(resultOrder);
    const done = new Set(mine.map((r) => r.entryId));
    return {
      meetEventId: event.id,
      meetId: event.meetId,
      eventTypeId: event.eventTypeId,
      eventCode: event.eventType.code,
      eventName: event.eventType.name,
      resultKind: ResultKindEnum[event.eventType.resultKind],
      division: DivisionEnum[event.division],
      usesHead: Boolean(event.eventType.usesHead),
      teamSize: event.eventType.teamSize,
      speciesId: event.speciesId,
      speciesName: event.speciesId ? (speciesById(event.speciesId)?.commonName ?? event.speciesId) : null,
      diameterMm: event.diameterMm,
      timeLimitHundredths: event.timeLimitHundredths,
      weight: event.weight,
      provisional: mine.some((r) => r.provisional),
      results: mine,
      waiting: entries.filter((e) => e.meetEventId === event.id && !done.has(e.id)).map(toEntryModel),
    };
  }
}

function checkStatus(meet: MeetEntity, correcting: boolean): void {
  if (meet.status === 'PUBLISHED' && !correcting) {
    throw DomainError.badInput('entryId', 'These results are published: make a correction and say why.');
  }
  if (!(correcting ? CORRECTING : RECORDING).includes(meet.status)) {
    throw DomainError.badInput('entryId', 'Results can be posted once the meet has closed its entries.');
  }
}

/** Places first, then did-not-finish, disqualified and scratch, as the engine orders them. */
export function resultOrder(a: ResultModel, b: ResultModel): number {
  const place = (r: ResultModel): number => r.place ?? Number.POSITIVE_INFINITY;
  return place(a) - place(b) || UNPLACED_ORDER[a.status] - UNPLACED_ORDER[b.status] || a.label.localeCompare(b.label);
}
