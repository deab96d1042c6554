import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Public } from '../common/auth/public.decorator.js';
import { Roles, SignedIn } from '../common/auth/roles.decorator.js';
import { CorrectResultInput, PageInput, RecordResultInput, RecordsFilter, ResultsFilter, ResultsSort } from './dto/result.inputs.js';
import { MeetEventResultsModel, MeetResultsModel, PublishResultsPayload, ResultAuditModel, ResultModel, ResultsPageModel } from './models/result.model.js';
import { AthleteResultsModel, ResultRecordModel } from './models/standings.model.js';
import { PublishService } from './publish.service.js';
import { ResultsBrowseService } from './results-browse.service.js';
import { ResultsService } from './results.service.js';

@Resolver()
export class ResultsResolver {
  constructor(
    @Inject(ResultsService) private readonly resultsService: ResultsService,
    @Inject(ResultsBrowseService) private readonly browseService: ResultsBrowseService,
    @Inject(PublishService) private readonly publishService: PublishService,
  ) {}

  @Query(() => MeetResultsModel, { description: "A meet's results per event; visitors see them once published" })
  @Public()
  meetResults(@CurrentUser() actor: AuthUser | null, @Args('meetId', { type: () => ID }) meetId: string): Promise<MeetResultsModel> {
    return this.resultsService.meetResults(actor, meetId);
  }

  @Query(() => AthleteResultsModel, { description: "An athlete's published results and personal bests" })
  @Public()
  athleteResults(@Args('athleteId', { type: () => ID }) athleteId: string): Promise<AthleteResultsModel> {
    return this.browseService.athlete(athleteId);
  }

  @Query(() => [ResultModel], { description: "An axe's latest published results (at most 50), newest first; for whoever may see the axe" })
  @Public()
  axeResults(@CurrentUser() actor: AuthUser | null, @Args('axeId', { type: () => ID }) axeId: string): Promise<ResultModel[]> {
    return this.browseService.axeResults(actor, axeId);
  }

  @Query(() => [ResultRecordModel], { description: 'Best published result per event, species and diameter' })
  @Public()
  records(@Args('filter', { type: () => RecordsFilter, nullable: true }) filter?: RecordsFilter | null): Promise<ResultRecordModel[]> {
    return this.browseService.records(filter ?? null);
  }

  @Query(() => ResultsPageModel, { description: 'Published results across every club, filtered, sorted and paged on the server' })
  @Public()
  results(
    @Args('filter', { type: () => ResultsFilter, nullable: true }) filter?: ResultsFilter | null,
    @Args('sort', { type: () => ResultsSort, nullable: true }) sort?: ResultsSort | null,
    @Args('page', { type: () => PageInput, nullable: true }) page?: PageInput | null,
  ): Promise<ResultsPageModel> {
    return this.browseService.search(filter ?? null, sort ?? null, page ?? null);
  }

  @Query(() => [ResultAuditModel], { description: "Every change to a meet's results, newest first" })
  @Roles('ORGANISER')
  resultAudit(@Args('meetId', { type: () => ID }) meetId: string): Promise<ResultAuditModel[]> {
    return this.browseService.audit(meetId);
  }

  @Mutation(() => MeetEventResultsModel, { description: "Post or change a result before the meet is published (organisers and the meet's timekeepers); the event is re-ranked" })
  @SignedIn()
  recordResult(@CurrentUser() actor: AuthUser, @Args('input') input: RecordResultInput): Promise<MeetEventResultsModel> {
    return this.resultsService.record(actor, input);
  }

  @Mutation(() => MeetEventResultsModel, { description: 'Change a result with a reason (kept in the audit log); places, points and standings follow' })
  @Roles('ORGANISER')
  correctResult(@CurrentUser() actor: AuthUser, @Args('input') input: CorrectResultInput): Promise<MeetEventResultsModel> {
    return this.resultsService.correct(actor, input);
  }

  @Mutation(() => PublishResultsPayload, { description: "Open a meet's results to everyone and e-mail each entered club's coaches" })
  @Roles('ORGANISER')
  publishMeetResults(@CurrentUser() actor: AuthUser, @Args('meetId', { type: () => ID }) meetId: string): Promise<PublishResultsPayload> {
    return this.publishService.publish(actor, meetId);
  }
}
