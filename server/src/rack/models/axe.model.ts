import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

import { AxeServiceKindEnum, AxeStatusEnum, AxeUseEnum, GrindEnum } from './rack.enums.js';

@ObjectType('HeadGeometry', { description: 'Bevel geometry of a symmetric bit; both angles given, clearly labelled' })
export class HeadGeometryModel {
  @Field(() => Float, { nullable: true, description: 'Included angle across both faces, degrees' })
  includedAngleDeg: number | null;

  @Field(() => Float, { nullable: true, description: 'Angle of each face to the centre plane: half the included angle' })
  perSideAngleDeg: number | null;

  @Field(() => Float, { nullable: true })
  chiselWidthMm: number | null;

  @Field(() => Float, { nullable: true, description: 'Bit thickness at the chisel shoulder: 2 × chisel width × tan(per-side angle)' })
  shoulderThicknessMm: number | null;
}

@ObjectType('AxePhoto')
export class AxePhotoModel {
  @Field(() => ID)
  id: string;

  @Field(() => String, { description: 'Where to fetch the image; carries a short-lived signature for a private axe' })
  url: string;

  @Field(() => String, { description: 'A copy at most 320 px wide, for lists' })
  thumbnailUrl: string;

  @Field(() => Int)
  width: number;

  @Field(() => Int)
  height: number;

  @Field(() => String)
  mimeType: string;

  @Field(() => Int)
  byteSize: number;

  @Field(() => String)
  caption: string;

  @Field(() => Date)
  uploadedAt: Date;
}

@ObjectType('AxeSetupChange')
export class AxeSetupChangeModel {
  @Field(() => String, { description: 'Axe field name, e.g. bevelIncludedDeg (SI units, as stored)' })
  field: string;

  @Field(() => String, { nullable: true })
  before: string | null;

  @Field(() => String, { nullable: true })
  after: string | null;
}

@ObjectType('AxeService')
export class AxeServiceModel {
  @Field(() => ID)
  id: string;

  @Field(() => AxeServiceKindEnum)
  kind: AxeServiceKindEnum;

  @Field(() => String, { description: 'ISO date' })
  doneOn: string;

  @Field(() => String)
  doneBy: string;

  @Field(() => String)
  notes: string;

  @Field(() => [AxeSetupChangeModel])
  changes: AxeSetupChangeModel[];

  @Field(() => Date)
  loggedAt: Date;
}

@ObjectType('Axe')
export class AxeModel {
  @Field(() => ID)
  id: string;

  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  clubName: string;

  @Field(() => String)
  label: string;

  @Field(() => String)
  maker: string;

  @Field(() => Int, { nullable: true, description: 'Grams' })
  headWeightG: number | null;

  @Field(() => Float, { nullable: true, description: 'Millimetres' })
  bitWidthMm: number | null;

  @Field(() => GrindEnum)
  grind: GrindEnum;

  @Field(() => HeadGeometryModel)
  geometry: HeadGeometryModel;

  @Field(() => Float, { nullable: true, description: 'Millimetres' })
  handleLengthMm: number | null;

  @Field(() => String)
  handleWood: string;

  @Field(() => Boolean)
  hangChecked: boolean;

  @Field(() => Boolean)
  pinned: boolean;

  @Field(() => AxeStatusEnum)
  status: AxeStatusEnum;

  @Field(() => AxeUseEnum)
  allowedFor: AxeUseEnum;

  @Field(() => Boolean)
  isPublic: boolean;

  @Field(() => String)
  notes: string;

  @Field(() => String, { nullable: true, description: 'ISO date of the latest service' })
  lastServicedOn: string | null;

  @Field(() => Int)
  photoCount: number;

  @Field(() => Date)
  updatedAt: Date;
}

@ObjectType('AxeDetail')
export class AxeDetailModel extends AxeModel {
  @Field(() => [AxeServiceModel], { description: 'Newest first' })
  services: AxeServiceModel[];

  @Field(() => [AxePhotoModel])
  photos: AxePhotoModel[];

  @Field(() => Boolean, { description: "The caller may edit this axe (its club's coach or an admin)" })
  canManage: boolean;
}

@ObjectType('Rack')
export class RackModel {
  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  clubName: string;

  @Field(() => Boolean)
  canManage: boolean;

  @Field(() => Boolean, { description: 'False when only the public axes are shown' })
  isMember: boolean;

  @Field(() => [AxeModel])
  axes: AxeModel[];
}
