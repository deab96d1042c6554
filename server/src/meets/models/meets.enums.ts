import { registerEnumType } from '@nestjs/graphql';

export enum ResultKindEnum {
  TIMED = 'TIMED',
  SCORED = 'SCORED',
  FEWEST_HITS = 'FEWEST_HITS',
}
registerEnumType(ResultKindEnum, { name: 'ResultKind', description: 'Timed: lower wins; scored: higher wins; fewest hits: fewer wins, time breaks ties' });

export enum MeetStatusEnum {
  DRAFT = 'DRAFT',
  OPEN = 'OPEN',
  CLOSED = 'CLOSED',
  RUNNING = 'RUNNING',
  PUBLISHED = 'PUBLISHED',
  ARCHIVED = 'ARCHIVED',
}
registerEnumType(MeetStatusEnum, { name: 'MeetStatus' });

export enum ScoringSchemeEnum {
  FIXED_TABLE = 'FIXED_TABLE',
  FIELD_SIZE = 'FIELD_SIZE',
  PERCENT_OF_BEST = 'PERCENT_OF_BEST',
}
registerEnumType(ScoringSchemeEnum, {
  name: 'ScoringScheme',
  description: 'Fixed place-points table; points from field size; percentage of the best (100 × best ÷ own)',
});

export enum MeetWhenEnum {
  UPCOMING = 'UPCOMING',
  PAST = 'PAST',
}
registerEnumType(MeetWhenEnum, { name: 'MeetWhen' });
