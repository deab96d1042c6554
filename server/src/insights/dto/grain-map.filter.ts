import { Field, Float, ID, InputType } from '@nestjs/graphql';

import { DivisionEnum } from '../../league/models/league.enums.js';

/** What the Grain Map is computed over; every list left empty means "all". */
@InputType()
export class GrainMapFilter {
  @Field(() => ID, { description: 'One event type: times from different events never mix' })
  eventTypeId: string;

  @Field(() => DivisionEnum, { nullable: true })
  division?: DivisionEnum | null;

  @Field(() => [ID], { nullable: true })
  seasonIds?: string[] | null;

  @Field(() => [ID], { nullable: true })
  clubIds?: string[] | null;

  @Field(() => String, { nullable: true, description: 'Block condition id, lower case (green, seasoned …)' })
  condition?: string | null;

  @Field(() => Float, { nullable: true })
  diameterMinMm?: number | null;

  @Field(() => Float, { nullable: true })
  diameterMaxMm?: number | null;

  @Field(() => String, { nullable: true, description: 'Only heads in this bevel band (e.g. bevel-14-16)' })
  bevelBand?: string | null;

  @Field(() => String, { nullable: true, description: 'Only heads in this chisel band' })
  chiselBand?: string | null;

  @Field(() => Boolean, { nullable: true, description: 'Split cells by bevel band' })
  byBevelBand?: boolean | null;

  @Field(() => Boolean, { nullable: true, description: 'Split cells by chisel band' })
  byChiselBand?: boolean | null;

  @Field(() => Boolean, { nullable: true, description: 'Split cells by block condition' })
  byCondition?: boolean | null;

  @Field(() => Boolean, { nullable: true, description: "Normalise with the exponent fitted from the league's data" })
  fittedExponent?: boolean | null;
}

@InputType()
export class HandicapMarkInput {
  @Field(() => ID)
  athleteId: string;

  @Field(() => Float, { nullable: true, description: 'Seconds after "go"; null removes the override' })
  markSeconds?: number | null;

  @Field(() => String, { nullable: true })
  note?: string | null;
}
