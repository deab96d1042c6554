import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

import { DivisionEnum } from '../../league/models/league.enums.js';
import { MeetStatusEnum } from '../../meets/models/meets.enums.js';
import { ResultModel } from './result.model.js';

@ObjectType('ClubStanding')
export class ClubStandingModel {
  @Field(() => ID) clubId: string;
  @Field(() => String) clubName: string;
  @Field(() => String) clubShortName: string;
  @Field(() => Float) points: number;
  @Field(() => Int) place: number;
  @Field(() => Boolean) tied: boolean;
  @Field(() => [Int], { description: 'Event places won: firsts, seconds, …' }) placeCounts: number[];
  @Field(() => Int, { description: 'Meets scored in (season standings); 1 in a meet' }) meets: number;
}

@ObjectType('DivisionStanding')
export class DivisionStandingModel {
  @Field(() => DivisionEnum) division: DivisionEnum;
  @Field(() => Boolean) provisional: boolean;
  @Field(() => [ClubStandingModel]) clubs: ClubStandingModel[];
}

@ObjectType('MeetStandings')
export class MeetStandingsModel {
  @Field(() => ID) meetId: string;
  @Field(() => String) meetName: string;
  @Field(() => String) startsOn: string;
  @Field(() => MeetStatusEnum) status: MeetStatusEnum;
  @Field(() => Boolean) published: boolean;
  @Field(() => String, { description: 'The tie-break rule in words, to print under the table' }) tieBreak: string;
  @Field(() => Boolean) provisional: boolean;
  @Field(() => [DivisionStandingModel]) divisions: DivisionStandingModel[];
  @Field(() => [ResultModel], { description: 'First places of each event' }) eventWinners: ResultModel[];
}

@ObjectType('StandingsMeet')
export class StandingsMeetModel {
  @Field(() => ID) id: string;
  @Field(() => String) name: string;
  @Field(() => String) startsOn: string;
}

@ObjectType('SeasonStandings')
export class SeasonStandingsModel {
  @Field(() => ID) seasonId: string;
  @Field(() => String) seasonName: string;
  @Field(() => String, { description: 'The tie-break rule in words, to print under the table' }) tieBreak: string;
  @Field(() => Boolean) provisional: boolean;
  @Field(() => [StandingsMeetModel], { description: 'Published meets counted' }) meets: StandingsMeetModel[];
  @Field(() => [DivisionStandingModel]) divisions: DivisionStandingModel[];
}

@ObjectType('PersonalBest')
export class PersonalBestModel {
  @Field(() => ID) eventTypeId: string;
  @Field(() => String) eventName: string;
  @Field(() => Float, { nullable: true }) diameterMm: number | null;
  @Field(() => ResultModel) result: ResultModel;
}

@ObjectType('AthleteResults')
export class AthleteResultsModel {
  @Field(() => ID) athleteId: string;
  @Field(() => String) name: string;
  @Field(() => ID) clubId: string;
  @Field(() => String) clubName: string;
  @Field(() => [PersonalBestModel], { description: 'Best per event and block diameter' }) personalBests: PersonalBestModel[];
  @Field(() => [ResultModel], { description: 'Every published result, oldest first' }) results: ResultModel[];
}

@ObjectType('ResultRecord', { description: 'The best result per event, species and diameter' })
export class ResultRecordModel {
  @Field(() => ID) eventTypeId: string;
  @Field(() => String) eventName: string;
  @Field(() => String, { nullable: true }) speciesId: string | null;
  @Field(() => String, { nullable: true }) speciesName: string | null;
  @Field(() => Float, { nullable: true }) diameterMm: number | null;
  @Field(() => ResultModel) result: ResultModel;
}
