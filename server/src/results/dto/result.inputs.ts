import { Field, Float, ID, InputType, Int } from '@nestjs/graphql';

import { DivisionEnum } from '../../league/models/league.enums.js';
import { GrindEnum } from '../../rack/models/rack.enums.js';
import { BlockConditionEnum, ResultSortDirectionEnum, ResultSortFieldEnum, ResultStatusEnum } from '../models/results.enums.js';

@InputType()
export class RecordResultInput {
  @Field(() => ID)
  entryId: string;

  @Field(() => ResultStatusEnum)
  status: ResultStatusEnum;

  @Field(() => [String], { nullable: true, description: 'One to three watch times, m:ss.hh or ss.hh' })
  times?: string[] | null;

  @Field(() => Float, { nullable: true, description: 'Score (scored events) or hits (fewest-hits events)' })
  score?: number | null;

  @Field(() => Float, { nullable: true })
  penaltySeconds?: number | null;

  @Field(() => String, { nullable: true, description: 'Why the result was disqualified' })
  dqReason?: string | null;

  @Field(() => Int, { nullable: true, description: 'Finishing order in a run-off among tied results' })
  runOffRank?: number | null;

  @Field(() => ID, { nullable: true, description: "An axe from the entrant's club rack; its setup fills the head fields left empty" })
  axeId?: string | null;

  @Field(() => String, { nullable: true })
  axeLabel?: string | null;

  @Field(() => GrindEnum, { nullable: true })
  grind?: GrindEnum | null;

  @Field(() => Float, { nullable: true, description: 'Included angle, degrees' })
  bevelIncludedDeg?: number | null;

  @Field(() => Float, { nullable: true })
  chiselWidthMm?: number | null;

  @Field(() => BlockConditionEnum, { nullable: true })
  condition?: BlockConditionEnum | null;
}

@InputType()
export class CorrectResultInput extends RecordResultInput {
  @Field(() => String, { description: 'Why the published result changes; kept in the audit log' })
  correctionReason: string;
}

@InputType()
export class ResultsFilter {
  @Field(() => ID, { nullable: true }) seasonId?: string | null;
  @Field(() => ID, { nullable: true }) meetId?: string | null;
  @Field(() => ID, { nullable: true }) clubId?: string | null;
  @Field(() => ID, { nullable: true }) eventTypeId?: string | null;
  @Field(() => DivisionEnum, { nullable: true }) division?: DivisionEnum | null;
  @Field(() => String, { nullable: true }) speciesId?: string | null;
  @Field(() => Float, { nullable: true }) diameterMinMm?: number | null;
  @Field(() => Float, { nullable: true }) diameterMaxMm?: number | null;
  @Field(() => GrindEnum, { nullable: true }) grind?: GrindEnum | null;
  @Field(() => Float, { nullable: true }) bevelMinDeg?: number | null;
  @Field(() => Float, { nullable: true }) bevelMaxDeg?: number | null;
  @Field(() => BlockConditionEnum, { nullable: true }) condition?: BlockConditionEnum | null;
  @Field(() => Boolean, { nullable: true, description: 'Only finished results' }) finishedOnly?: boolean | null;
}

@InputType()
export class ResultsSort {
  @Field(() => ResultSortFieldEnum) field: ResultSortFieldEnum;
  @Field(() => ResultSortDirectionEnum, { defaultValue: ResultSortDirectionEnum.ASC }) direction: ResultSortDirectionEnum;
}

@InputType()
export class PageInput {
  @Field(() => Int, { defaultValue: 0, description: '0-based' }) page: number;
  @Field(() => Int, { defaultValue: 25, description: 'At most 100' }) pageSize: number;
}

@InputType()
export class RecordsFilter {
  @Field(() => ID, { nullable: true }) seasonId?: string | null;
  @Field(() => ID, { nullable: true }) eventTypeId?: string | null;
  @Field(() => String, { nullable: true }) speciesId?: string | null;
  @Field(() => DivisionEnum, { nullable: true }) division?: DivisionEnum | null;
}
