import { Field, ID, ObjectType, registerEnumType } from '@nestjs/graphql';

export enum RoleEnum {
  ADMIN = 'ADMIN',
  ORGANISER = 'ORGANISER',
  COACH = 'COACH',
  ATHLETE = 'ATHLETE',
}
registerEnumType(RoleEnum, { name: 'Role', description: 'Account role' });

export enum UnitSystemEnum {
  METRIC = 'METRIC',
  IMPERIAL = 'IMPERIAL',
}
registerEnumType(UnitSystemEnum, { name: 'UnitSystem', description: 'Millimetres and kilograms, or inches and pounds' });

@ObjectType('ClubMembership')
export class ClubMembershipModel {
  @Field(() => ID)
  clubId: string;

  @Field(() => String)
  clubName: string;

  @Field(() => RoleEnum)
  role: RoleEnum;
}

@ObjectType('User')
export class UserModel {
  @Field(() => ID)
  id: string;

  @Field(() => String)
  email: string;

  @Field(() => String)
  displayName: string;

  @Field(() => RoleEnum)
  role: RoleEnum;

  @Field(() => Boolean)
  emailVerified: boolean;

  @Field(() => UnitSystemEnum)
  unitSystem: UnitSystemEnum;

  @Field(() => [ClubMembershipModel])
  clubs: ClubMembershipModel[];
}
