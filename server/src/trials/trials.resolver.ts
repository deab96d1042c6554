import { Inject } from '@nestjs/common';
import { Args, ID, Mutation, Query, Resolver } from '@nestjs/graphql';

import type { AuthUser } from '../common/auth/auth-user.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { Roles, SignedIn } from '../common/auth/roles.decorator.js';
import { SaveTrialInput } from './dto/save-trial.input.js';
import { AxeTrialModel } from './models/axe-trial.model.js';
import { TrialSetupModel } from './models/trial-setup.model.js';
import { TrialFindingModel, TrialListModel, TrialModel } from './models/trial.model.js';
import { TrialFindingsService } from './trial-findings.service.js';
import { TrialRecordingService } from './trial-recording.service.js';
import { TrialsService } from './trials.service.js';

@Resolver()
export class TrialsResolver {
  constructor(
    @Inject(TrialsService) private readonly trialsService: TrialsService,
    @Inject(TrialRecordingService) private readonly recordingService: TrialRecordingService,
    @Inject(TrialFindingsService) private readonly findingsService: TrialFindingsService,
  ) {}

  @Query(() => TrialListModel, { description: "A club's trials, newest first: for the club's members" })
  @SignedIn()
  trials(@CurrentUser() actor: AuthUser, @Args('clubId', { type: () => ID }) clubId: string): Promise<TrialListModel> {
    return this.trialsService.list(actor, clubId);
  }

  @Query(() => TrialModel, { description: "One trial with its verdict: for the club's members" })
  @SignedIn()
  trial(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string): Promise<TrialModel> {
    return this.trialsService.detail(actor, id);
  }

  @Query(() => [AxeTrialModel], { description: "The trials an axe took part in, newest first: for its club's members" })
  @SignedIn()
  axeTrials(@CurrentUser() actor: AuthUser, @Args('axeId', { type: () => ID }) axeId: string): Promise<AxeTrialModel[]> {
    return this.trialsService.axeTrials(actor, axeId);
  }

  @Query(() => TrialSetupModel, { description: "The rack and roster a club's coach records a trial from" })
  @Roles('COACH')
  trialSetup(@CurrentUser() actor: AuthUser, @Args('clubId', { type: () => ID }) clubId: string): Promise<TrialSetupModel> {
    return this.trialsService.setup(actor, clubId);
  }

  @Mutation(() => TrialModel, { description: 'Create or replace a whole trial; a resend with the same saveToken is answered, not repeated' })
  @Roles('COACH')
  saveTrial(@CurrentUser() actor: AuthUser, @Args('input') input: SaveTrialInput): Promise<TrialModel> {
    return this.recordingService.save(actor, input);
  }

  @Mutation(() => Boolean)
  @Roles('COACH')
  deleteTrial(@CurrentUser() actor: AuthUser, @Args('id', { type: () => ID }) id: string): Promise<boolean> {
    return this.trialsService.remove(actor, id);
  }

  @Mutation(() => TrialFindingModel, { description: 'Store the trial summary for the knowledge base and open a draft Field Note from it' })
  @Roles('COACH')
  publishTrialFinding(@CurrentUser() actor: AuthUser, @Args('trialId', { type: () => ID }) trialId: string): Promise<TrialFindingModel> {
    return this.findingsService.publish(actor, trialId);
  }
}
