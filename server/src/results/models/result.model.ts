import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

import { DivisionEnum } from '../../league/models/league.enums.js';
import { EntryAthleteModel, EntryModel } from '../../meets/models/meet.model.js';
import { MeetStatusEnum, ResultKindEnum } from '../../meets/models/meets.enums.js';
import { GrindEnum } from '../../rack/models/rack.enums.js';
import { BlockConditionEnum, ResultStatusEnum } from './results.enums.js';

@ObjectType('Result', { description: 'One entry\'s result: what was posted and what it earned (computed, never typed)' })
export class ResultModel {
  @Field(() => ID) id: string;
  @Field(() => ID) entryId: string;
  @Field(() => ID) meetEventId: string;
  @Field(() => ID) meetId: string;
  @Field(() => String) meetName: string;
  @Field(() => String, { description: 'ISO date of the meet' }) meetDate: string;
  @Field(() => ID) seasonId: string;
  @Field(() => ID) eventTypeId: string;
  @Field(() => String) eventCode: string;
  @Field(() => String) eventName: string;
  @Field(() => ResultKindEnum) resultKind: ResultKindEnum;
  @Field(() => DivisionEnum) division: DivisionEnum;
  @Field(() => ID) clubId: string;
  @Field(() => String) clubName: string;
  @Field(() => String) clubShortName: string;
  @Field(() => [EntryAthleteModel]) athletes: EntryAthleteModel[];
  @Field(() => String, { description: 'Athletes joined with " & "' }) label: string;
  @Field(() => ResultStatusEnum, { description: 'After the time limit: an over-limit run reads DISQUALIFIED' }) status: ResultStatusEnum;
  @Field(() => ResultStatusEnum, { description: 'As posted' }) postedStatus: ResultStatusEnum;
  @Field(() => String, { nullable: true, description: 'Why it was disqualified' }) reason: string | null;
  @Field(() => [Int], { description: 'Raw watch times, hundredths' }) rawTimes: number[];
  @Field(() => Int, { nullable: true, description: 'Official time before penalties, hundredths' }) timeHundredths: number | null;
  @Field(() => Int) penaltyHundredths: number;
  @Field(() => Int, { nullable: true, description: 'Official time plus penalties, hundredths' }) totalHundredths: number | null;
  @Field(() => Float, { nullable: true }) score: number | null;
  @Field(() => Int, { nullable: true }) place: number | null;
  @Field(() => Boolean) tied: boolean;
  @Field(() => Float) points: number;
  @Field(() => Boolean, { description: "False for a club's extra entries when only its best scores" }) countsForClub: boolean;
  @Field(() => Boolean, { description: 'Shared only until a run-off is run' }) provisional: boolean;
  @Field(() => Int, { nullable: true }) runOffRank: number | null;
  @Field(() => ID, { nullable: true }) axeId: string | null;
  @Field(() => String, { nullable: true }) axeLabel: string | null;
  @Field(() => GrindEnum, { nullable: true }) grind: GrindEnum | null;
  @Field(() => Float, { nullable: true }) bevelIncludedDeg: number | null;
  @Field(() => Float, { nullable: true }) chiselWidthMm: number | null;
  @Field(() => String, { nullable: true }) speciesId: string | null;
  @Field(() => String, { nullable: true }) speciesName: string | null;
  @Field(() => Float, { nullable: true }) diameterMm: number | null;
  @Field(() => BlockConditionEnum, { nullable: true }) condition: BlockConditionEnum | null;
  @Field(() => Date) recordedAt: Date;
}

@ObjectType('MeetEventResults')
export class MeetEventResultsModel {
  @Field(() => ID) meetEventId: string;
  @Field(() => ID) meetId: string;
  @Field(() => ID) eventTypeId: string;
  @Field(() => String) eventCode: string;
  @Field(() => String) eventName: string;
  @Field(() => ResultKindEnum) resultKind: ResultKindEnum;
  @Field(() => DivisionEnum) division: DivisionEnum;
  @Field(() => Boolean) usesHead: boolean;
  @Field(() => Int) teamSize: number;
  @Field(() => String, { nullable: true }) speciesId: string | null;
  @Field(() => String, { nullable: true }) speciesName: string | null;
  @Field(() => Float, { nullable: true }) diameterMm: number | null;
  @Field(() => Int, { nullable: true }) timeLimitHundredths: number | null;
  @Field(() => Float) weight: number;
  @Field(() => Boolean, { description: 'Some places wait for a run-off' }) provisional: boolean;
  @Field(() => [ResultModel], { description: 'In place order, then did-not-finish, disqualified and scratch' }) results: ResultModel[];
  @Field(() => [EntryModel], { description: 'Entries with no result yet' }) waiting: EntryModel[];
}

@ObjectType('MeetResults')
export class MeetResultsModel {
  @Field(() => ID) meetId: string;
  @Field(() => String) meetName: string;
  @Field(() => String) startsOn: string;
  @Field(() => String) venue: string;
  @Field(() => ID) seasonId: string;
  @Field(() => String) seasonName: string;
  @Field(() => MeetStatusEnum) status: MeetStatusEnum;
  @Field(() => Boolean, { description: 'Results are out for everyone to read' }) published: boolean;
  @Field(() => Boolean, { description: 'The caller may post results now (and, as an organiser, correct published ones)' }) canRecord: boolean;
  @Field(() => Boolean, { description: 'The caller may publish these results (organisers)' }) canPublish: boolean;
  @Field(() => Boolean, { description: 'The caller sees these results as one of the meet\'s timekeepers' }) asTimekeeper: boolean;
  @Field(() => [MeetEventResultsModel], { description: 'Empty for visitors until the results are published' }) events: MeetEventResultsModel[];
}

@ObjectType('ResultsPage')
export class ResultsPageModel {
  @Field(() => Int, { description: 'Matching results, counted up to 10,000' }) total: number;
  @Field(() => Boolean, { description: 'More results match than total: narrow the filter, or export them all' }) capped: boolean;
  @Field(() => Int) page: number;
  @Field(() => Int) pageSize: number;
  @Field(() => [ResultModel]) rows: ResultModel[];
}

@ObjectType('ResultAuditEntry')
export class ResultAuditModel {
  @Field(() => ID) id: string;
  @Field(() => ID) resultId: string;
  @Field(() => ID) entryId: string;
  @Field(() => String, { description: 'RECORDED, CORRECTED or IMPORTED' }) action: string;
  @Field(() => String, { nullable: true }) reason: string | null;
  @Field(() => String, { nullable: true }) byName: string | null;
  @Field(() => Date) at: Date;
  @Field(() => String, { nullable: true, description: 'JSON of the result before' }) before: string | null;
  @Field(() => String, { description: 'JSON of the result after' }) after: string;
}

@ObjectType('PublishResultsPayload')
export class PublishResultsPayload {
  @Field(() => MeetResultsModel) meet: MeetResultsModel;
  @Field(() => Int, { description: 'Coaches e-mailed their placings' }) coachesMailed: number;
}
