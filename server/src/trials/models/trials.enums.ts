import { registerEnumType } from '@nestjs/graphql';

export enum TrialConditionEnum {
  GREEN = 'GREEN',
  SEASONED = 'SEASONED',
  DRY = 'DRY',
  PUNKY = 'PUNKY',
  FROZEN = 'FROZEN',
}
registerEnumType(TrialConditionEnum, { name: 'TrialCondition', description: 'The block on the day: green (wet), seasoned, dry, punky or frozen; knots are noted separately' });

export enum EdgeKeennessEnum {
  DULL = 'DULL',
  WORKING = 'WORKING',
  KEEN = 'KEEN',
}
registerEnumType(EdgeKeennessEnum, { name: 'EdgeKeenness', description: 'The edge as the tester judged it, worst first' });

export enum TrialFlagEnum {
  BINDS = 'BINDS',
  PLACED_AFTER_RELEASING_AXES = 'PLACED_AFTER_RELEASING_AXES',
  RELEASE_NOT_RECORDED = 'RELEASE_NOT_RECORDED',
  EDGE_DULL = 'EDGE_DULL',
  FEW_SWINGS = 'FEW_SWINGS',
  NO_COUNTED_SWINGS = 'NO_COUNTED_SWINGS',
}
registerEnumType(TrialFlagEnum, {
  name: 'TrialFlag',
  description: 'Why a row in the verdict needs a second look; PLACED_AFTER_RELEASING_AXES marks a binding axe that cut deeper than one placed above it',
});
