import { Field, Float, ID, InputType, Int } from '@nestjs/graphql';

import { EdgeKeennessEnum, TrialConditionEnum } from '../models/trials.enums.js';

@InputType()
export class TrialTesterInput {
  @Field(() => ID, { description: 'Chosen by the recording device' })
  id: string;

  @Field(() => ID, { nullable: true, description: 'A roster athlete of the club; the name may then be left empty' })
  athleteId?: string | null;

  @Field(() => String, { defaultValue: '' })
  name: string;
}

@InputType()
export class TrialSwingInput {
  @Field(() => Float, { description: 'Penetration in millimetres' })
  depthMm: number;

  @Field(() => Boolean, { defaultValue: false, description: 'An opening stroke that lifts the first chip: left out of every figure' })
  opening: boolean;
}

@InputType()
export class TrialRunInput {
  @Field(() => ID, { description: 'Chosen by the recording device' })
  id: string;

  @Field(() => ID)
  axeId: string;

  @Field(() => ID, { description: 'One of the trial testers' })
  testerId: string;

  @Field(() => [TrialSwingInput])
  swings: TrialSwingInput[];

  @Field(() => Int, { nullable: true, description: 'Release scale step, 1 (binding) to 5 (springing free)' })
  releaseStep?: number | null;

  @Field(() => EdgeKeennessEnum, { nullable: true })
  keenness?: EdgeKeennessEnum | null;

  @Field(() => String, { defaultValue: '' })
  feel: string;

  @Field(() => String, { defaultValue: '' })
  notes: string;
}

/** A whole trial as the recording device holds it; saving replaces what the server has. */
@InputType()
export class SaveTrialInput {
  @Field(() => ID, { description: 'Chosen by the recording device, so a resend after a lost connection lands once' })
  id: string;

  @Field(() => ID)
  clubId: string;

  @Field(() => Int, { nullable: true, description: 'The version the device started from; null for a new trial' })
  baseVersion?: number | null;

  @Field(() => String, { description: 'New for every local change; a resend with the same token is answered with the saved trial' })
  saveToken: string;

  @Field(() => String, {
    nullable: true,
    description: 'The token of an earlier send whose answer never came back; if that send landed, this save builds on it',
  })
  unansweredToken?: string | null;

  @Field(() => String, { description: 'ISO date' })
  testedOn: string;

  @Field(() => String, { description: 'A species id from the species table' })
  speciesId: string;

  @Field(() => Float, { description: 'Block diameter in millimetres' })
  diameterMm: number;

  @Field(() => TrialConditionEnum)
  condition: TrialConditionEnum;

  @Field(() => String, { defaultValue: '', description: 'Knots noted on the block' })
  knots: string;

  @Field(() => String, { defaultValue: '', description: 'Which face of the block was used' })
  faceUsed: string;

  @Field(() => Float, { nullable: true, description: 'Air temperature, degrees Celsius' })
  airTempC?: number | null;

  @Field(() => ID)
  referenceAxeId: string;

  @Field(() => String, { defaultValue: '' })
  notes: string;

  @Field(() => [TrialTesterInput])
  testers: TrialTesterInput[];

  @Field(() => [TrialRunInput], { defaultValue: [] })
  runs: TrialRunInput[];
}
