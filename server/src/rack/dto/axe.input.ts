import { Field, Float, InputType, Int } from '@nestjs/graphql';

import { AxeStatusEnum, AxeUseEnum, GrindEnum } from '../models/rack.enums.js';

/** An axe's whole record as the add/edit form sends it; lengths in mm, mass in g, angles in degrees. */
@InputType()
export class AxeInput {
  @Field(() => String)
  label: string;

  @Field(() => String, { defaultValue: '' })
  maker: string;

  @Field(() => Int, { nullable: true, description: 'Head weight in grams' })
  headWeightG?: number | null;

  @Field(() => Float, { nullable: true, description: 'Bit (cutting edge) width in millimetres' })
  bitWidthMm?: number | null;

  @Field(() => GrindEnum)
  grind: GrindEnum;

  @Field(() => Float, { nullable: true, description: 'Bevel as the included angle across both faces, in degrees' })
  bevelIncludedDeg?: number | null;

  @Field(() => Float, { nullable: true, description: 'Chisel (secondary bevel) width straight back from the edge, in millimetres' })
  chiselWidthMm?: number | null;

  @Field(() => Float, { nullable: true, description: 'Handle length in millimetres' })
  handleLengthMm?: number | null;

  @Field(() => String, { defaultValue: '' })
  handleWood: string;

  @Field(() => Boolean, { defaultValue: false })
  hangChecked: boolean;

  @Field(() => Boolean, { defaultValue: false })
  pinned: boolean;

  @Field(() => AxeStatusEnum, { defaultValue: AxeStatusEnum.READY })
  status: AxeStatusEnum;

  @Field(() => AxeUseEnum, { defaultValue: AxeUseEnum.ANYONE })
  allowedFor: AxeUseEnum;

  @Field(() => Boolean, { defaultValue: false, description: 'Show this axe outside the club' })
  isPublic: boolean;

  @Field(() => String, { defaultValue: '' })
  notes: string;
}

@InputType()
export class RackFilter {
  @Field(() => [GrindEnum], { nullable: true })
  grinds?: GrindEnum[] | null;

  @Field(() => [AxeStatusEnum], { nullable: true })
  statuses?: AxeStatusEnum[] | null;

  @Field(() => [AxeUseEnum], { nullable: true })
  allowedFor?: AxeUseEnum[] | null;
}
