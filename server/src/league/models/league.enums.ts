import { registerEnumType } from '@nestjs/graphql';

export enum DivisionEnum {
  MENS = 'MENS',
  WOMENS = 'WOMENS',
  MIXED = 'MIXED',
}
registerEnumType(DivisionEnum, { name: 'Division', description: "Men's, women's or mixed" });

export enum ExperienceEnum {
  ROOKIE = 'ROOKIE',
  DEVELOPING = 'DEVELOPING',
  EXPERIENCED = 'EXPERIENCED',
}
registerEnumType(ExperienceEnum, { name: 'ExperienceLevel' });

export enum ClubRoleEnum {
  COACH = 'COACH',
  ATHLETE = 'ATHLETE',
}
registerEnumType(ClubRoleEnum, { name: 'ClubRole', description: 'A club-scoped role' });
