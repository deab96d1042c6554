import { registerEnumType } from '@nestjs/graphql';

export enum ResultStatusEnum {
  FINISHED = 'FINISHED',
  SCRATCH = 'SCRATCH',
  DID_NOT_FINISH = 'DID_NOT_FINISH',
  DISQUALIFIED = 'DISQUALIFIED',
}
registerEnumType(ResultStatusEnum, { name: 'ResultStatus', description: 'Finished; scratch (entered, no time); did not finish; disqualified (with a reason)' });

export enum BlockConditionEnum {
  GREEN = 'GREEN',
  SEASONED = 'SEASONED',
  DRY = 'DRY',
  PUNKY = 'PUNKY',
  FROZEN = 'FROZEN',
  KNOTTY = 'KNOTTY',
}
registerEnumType(BlockConditionEnum, { name: 'BlockCondition', description: 'The block on the day: green (wet), seasoned, dry, punky, frozen or knotty' });

export enum ResultSortFieldEnum {
  TIME = 'TIME',
  SCORE = 'SCORE',
  PLACE = 'PLACE',
  POINTS = 'POINTS',
  DATE = 'DATE',
  DIAMETER = 'DIAMETER',
  BEVEL = 'BEVEL',
}
registerEnumType(ResultSortFieldEnum, { name: 'ResultSortField', description: 'TIME sorts by official time plus penalties' });

export enum ResultSortDirectionEnum {
  ASC = 'ASC',
  DESC = 'DESC',
}
registerEnumType(ResultSortDirectionEnum, { name: 'ResultSortDirection' });
