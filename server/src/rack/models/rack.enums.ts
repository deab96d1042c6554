import { registerEnumType } from '@nestjs/graphql';

export enum GrindEnum {
  FLAT = 'FLAT',
  CONVEX = 'CONVEX',
  CHISEL = 'CHISEL',
  COMPOUND = 'COMPOUND',
}
registerEnumType(GrindEnum, {
  name: 'Grind',
  description: 'Flat; convex ("banana"); chisel (a secondary bevel at the edge); compound (a flat or convex body with a chisel at the edge)',
});

export enum AxeStatusEnum {
  READY = 'READY',
  NEEDS_EDGE = 'NEEDS_EDGE',
  NEEDS_HANDLE = 'NEEDS_HANDLE',
  HEAD_LOOSE = 'HEAD_LOOSE',
  RETIRED = 'RETIRED',
}
registerEnumType(AxeStatusEnum, { name: 'AxeStatus', description: 'Head loose, needs handle and retired axes cannot be handed out' });

export enum AxeUseEnum {
  ANYONE = 'ANYONE',
  DEVELOPING_UP = 'DEVELOPING_UP',
  EXPERIENCED_ONLY = 'EXPERIENCED_ONLY',
}
registerEnumType(AxeUseEnum, { name: 'AxeUse', description: 'Who may swing the axe: anyone, developing and experienced athletes, or experienced only' });

export enum AxeServiceKindEnum {
  REGRIND = 'REGRIND',
  HONE = 'HONE',
  REHANG = 'REHANG',
  TIGHTEN_OR_PIN = 'TIGHTEN_OR_PIN',
  INSPECT = 'INSPECT',
  RETIRE = 'RETIRE',
  SETUP_CORRECTED = 'SETUP_CORRECTED',
}
registerEnumType(AxeServiceKindEnum, {
  name: 'AxeServiceKind',
  description: 'Work done on an axe; SETUP_CORRECTED is written when the setup is edited directly, so history stays whole',
});
