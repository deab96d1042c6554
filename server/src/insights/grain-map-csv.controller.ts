import { Controller, Get, Header, Inject, Query } from '@nestjs/common';

import { SignedIn } from '../common/auth/roles.decorator.js';
import { DomainError } from '../common/errors/domain-error.js';
import { DivisionEnum } from '../league/models/league.enums.js';
import type { GrainMapFilter } from './dto/grain-map.filter.js';
import { InsightsService } from './insights.service.js';

type QueryText = Record<string, string | string[] | undefined>;

/**
 * GET /api/grain-map.csv?eventTypeId=…&division=MENS&seasonIds=a,b&clubIds=…&condition=green
 * &diameterMinMm=…&diameterMaxMm=…&bevelBand=…&chiselBand=…&byBevelBand=1&fittedExponent=1
 * — the same matrix as the grainMap query, one row per cell.
 */
@Controller('api')
export class GrainMapCsvController {
  constructor(@Inject(InsightsService) private readonly insightsService: InsightsService) {}

  @Get('grain-map.csv')
  @SignedIn()
  @Header('content-type', 'text/csv; charset=utf-8')
  @Header('content-disposition', 'attachment; filename="grain-map.csv"')
  csv(@Query() query: QueryText): Promise<string> {
    return this.insightsService.csv(filterFromQuery(query));
  }
}

export function filterFromQuery(query: QueryText): GrainMapFilter {
  const text = (name: string): string | null => {
    const value = query[name];
    const one = Array.isArray(value) ? value[0] : value;
    return one === undefined || one === '' ? null : one;
  };
  const list = (name: string): string[] | null => text(name)?.split(',').filter(Boolean) ?? null;
  const num = (name: string): number | null => {
    const value = text(name);
    if (value === null) return null;
    const n = Number(value);
    if (!Number.isFinite(n)) throw DomainError.badInput(name, `${name} must be a number.`);
    return n;
  };
  const flag = (name: string): boolean => ['1', 'true'].includes(text(name) ?? '');
  const eventTypeId = text('eventTypeId');
  if (eventTypeId === null) throw DomainError.badInput('eventTypeId', 'Choose an event.');
  const division = text('division');
  if (division !== null && !(division in DivisionEnum)) throw DomainError.badInput('division', 'Unknown division.');
  return {
    eventTypeId,
    division: division as DivisionEnum | null,
    seasonIds: list('seasonIds'),
    clubIds: list('clubIds'),
    condition: text('condition'),
    diameterMinMm: num('diameterMinMm'),
    diameterMaxMm: num('diameterMaxMm'),
    bevelBand: text('bevelBand'),
    chiselBand: text('chiselBand'),
    byBevelBand: flag('byBevelBand'),
    byChiselBand: flag('byChiselBand'),
    byCondition: flag('byCondition'),
    fittedExponent: flag('fittedExponent'),
  };
}
