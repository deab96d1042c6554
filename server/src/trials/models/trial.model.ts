import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

import { TrialHeadModel } from './trial-head.model.js';
import { TrialRankingRowModel, TrialTesterEffectModel } from './trial-ranking.model.js';
import { EdgeKeennessEnum, TrialConditionEnum } from './trials.enums.js';

@ObjectType('TrialTester')
export class TrialTesterModel {
  @Field(() => ID)
  id: string;

  @Field(() => ID, { nullable: true, description: 'The roster athlete, when the tester is one' })
  athleteId: string | null;

  @Field(() => String)
  name: string;
}

@ObjectType('TrialSwing')
export class TrialSwingModel {
  @Field(() => Float, { description: 'Penetration, millimetres' })
  depthMm: number;

  @Field(() => Boolean, { description: 'An opening stroke: left out of every figure' })
  opening: boolean;
}

@ObjectType('TrialRun', { description: 'One axe swung by one tester on the block' })
export class TrialRunModel {
  @Field(() => ID)
  id: string;

  @Field(() => ID)
  axeId: string;

  @Field(() => String)
  axeLabel: string;

  @Field(() => ID)
  testerId: string;

  @Field(() => String)
  testerName: string;

  @Field(() => [TrialSwingModel])
  swings: TrialSwingModel[];

  @Field(() => Int, { nullable: true, description: 'Release scale step, 1 (binding) to 5 (springing free)' })
  releaseStep: number | null;

  @Field(() => EdgeKeennessEnum, { nullable: true })
  keenness: EdgeKeennessEnum | null;

  @Field(() => String)
  feel: string;

  @Field(() => String)
  notes: string;

  @Field(() => TrialHeadModel)
  head: TrialHeadModel;
}

@ObjectType('TrialFinding', { description: 'What "Publish as a finding" stored, and the draft Field Note it opened' })
export class TrialFindingModel {
  @Field(() => String)
  title: string;

  @Field(() => String)
  summary: string;

  @Field(() => String)
  bodyMarkdown: string;

  @Field(() => ID, { nullable: true })
  fieldNoteId: string | null;

  @Field(() => String, { nullable: true })
  fieldNoteSlug: string | null;

  @Field(() => Date)
  publishedAt: Date;
}

@ObjectType('TrialListItem')
export class TrialListItemModel {
  @Field(() => ID)
  id: string;

  @Field(() => String, { description: 'ISO date' })
  testedOn: string;

  @Field(() => String)
  speciesId: string;

  @Field(() => String)
  speciesName: string;

  @Field(() => TrialConditionEnum)
  condition: TrialConditionEnum;

  @Field(() => Float)
  diameterMm: number;

  @Field(() => String)
  referenceAxeLabel: string;

  @Field(() => Int, { description: 'Distinct axes swung' })
  axeCount: number;

  @Field(() => String, { nullable: true, description: 'The axe placed first in the verdict' })
  leaderLabel: string | null;

  @Field(() => Boolean)
  published: boolean;
}

@ObjectType('Trial')
export class TrialModel extends TrialListItemModel {
  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  clubName: string;

  @Field(() => String, { description: 'The block as people say it, e.g. "green quaking aspen"' })
  woodLabel: string;

  @Field(() => String)
  knots: string;

  @Field(() => String)
  faceUsed: string;

  @Field(() => Float, { nullable: true, description: 'Degrees Celsius' })
  airTempC: number | null;

  @Field(() => Boolean, { description: 'Frozen block or air at or below freezing: competition edges are not tested in frozen wood' })
  frozenWarning: boolean;

  @Field(() => ID)
  referenceAxeId: string;

  @Field(() => String)
  notes: string;

  @Field(() => Int, { description: 'Send it back as baseVersion when saving' })
  version: number;

  @Field(() => Boolean, { description: "The caller may edit it (its club's coach or an admin)" })
  canEdit: boolean;

  @Field(() => Date)
  updatedAt: Date;

  @Field(() => [TrialTesterModel])
  testers: TrialTesterModel[];

  @Field(() => [TrialRunModel])
  runs: TrialRunModel[];

  @Field(() => [TrialRankingRowModel], { description: 'The verdict, best first' })
  ranking: TrialRankingRowModel[];

  @Field(() => [TrialTesterEffectModel])
  testerEffects: TrialTesterEffectModel[];

  @Field(() => String, { description: 'The plain recommendation sentence' })
  recommendation: string;

  @Field(() => TrialFindingModel, { nullable: true })
  finding: TrialFindingModel | null;
}

@ObjectType('TrialList')
export class TrialListModel {
  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  clubName: string;

  @Field(() => Boolean, { description: 'The caller may record trials for this club' })
  canRecord: boolean;

  @Field(() => [TrialListItemModel], { description: 'Newest first' })
  trials: TrialListItemModel[];
}
