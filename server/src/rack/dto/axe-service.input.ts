import { Field, Float, ID, InputType, Int } from '@nestjs/graphql';

import { AxeServiceKindEnum, AxeStatusEnum, GrindEnum } from '../models/rack.enums.js';

/** Setup values a service changed; a field left out is unchanged, null clears it. */
@InputType()
export class AxeSetupChangeInput {
  @Field(() => GrindEnum, { nullable: true })
  grind?: GrindEnum | null;

  @Field(() => Float, { nullable: true, description: 'Included angle in degrees' })
  bevelIncludedDeg?: number | null;

  @Field(() => Float, { nullable: true })
  chiselWidthMm?: number | null;

  @Field(() => Int, { nullable: true })
  headWeightG?: number | null;

  @Field(() => Float, { nullable: true })
  bitWidthMm?: number | null;

  @Field(() => Float, { nullable: true })
  handleLengthMm?: number | null;

  @Field(() => String, { nullable: true })
  handleWood?: string | null;

  @Field(() => Boolean, { nullable: true })
  hangChecked?: boolean | null;

  @Field(() => Boolean, { nullable: true })
  pinned?: boolean | null;

  @Field(() => AxeStatusEnum, { nullable: true, description: 'Status after the work, e.g. READY after a regrind' })
  status?: AxeStatusEnum | null;
}

@InputType()
export class AxeServiceInput {
  @Field(() => ID)
  axeId: string;

  @Field(() => AxeServiceKindEnum)
  kind: AxeServiceKindEnum;

  @Field(() => String, { description: 'ISO date the work was done' })
  doneOn: string;

  @Field(() => String, { nullable: true, description: 'Who did the work; defaults to the signed-in user' })
  doneBy?: string | null;

  @Field(() => String, { defaultValue: '' })
  notes: string;

  @Field(() => AxeSetupChangeInput, { nullable: true })
  setup?: AxeSetupChangeInput | null;
}
