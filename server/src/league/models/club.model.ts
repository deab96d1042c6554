import { Field, ID, Int, ObjectType } from '@nestjs/graphql';

import { AthleteModel } from './athlete.model.js';
import { ClubRoleEnum } from './league.enums.js';

@ObjectType('ClubInvitation')
export class ClubInvitationModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  email: string;

  @Field(() => ClubRoleEnum)
  role: ClubRoleEnum;

  @Field(() => Date)
  expiresAt: Date;

  @Field(() => Date, { nullable: true })
  acceptedAt: Date | null;
}

@ObjectType('Club')
export class ClubModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  name: string;

  @Field(() => String)
  shortName: string;

  @Field(() => String)
  region: string;

  @Field(() => String, { nullable: true, description: 'Shown to signed-in users only' })
  contactEmail: string | null;

  @Field(() => String)
  colourPrimary: string;

  @Field(() => String)
  colourSecondary: string;

  @Field(() => Int)
  athleteCount: number;
}

@ObjectType('ClubDetail')
export class ClubDetailModel extends ClubModel {
  @Field(() => [AthleteModel])
  roster: AthleteModel[];

  @Field(() => Boolean, { description: 'The caller may manage this club (its coach or an admin)' })
  canManage: boolean;
}
