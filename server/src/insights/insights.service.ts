import { Inject, Injectable } from '@nestjs/common';
import { summariseTrial } from '@endgrain/shared';

import { DomainError } from '../common/errors/domain-error.js';
import type { GrainMapFilter } from './dto/grain-map.filter.js';
import { GrainMapCache } from './grain-map-cache.js';
import { computeGrainMap, grindsOf, speciesSummaries, type GrainComputation } from './grain-map-compute.js';
import { InsightsRepository } from './insights.repository.js';
import { grainMapCsv, toCellModel, toSettingsModel, toTrialCellModel } from './insights.mappers.js';
import type { GrainCellDetailModel, GrainMapModel } from './models/grain-map.model.js';

/** The Grain Map: rows from SQL, numbers from the shared rules, cached until a row changes. */
@Injectable()
export class InsightsService {
  private readonly cache = new GrainMapCache();

  constructor(@Inject(InsightsRepository) private readonly repo: InsightsRepository) {}

  async grainMap(filter: GrainMapFilter): Promise<GrainMapModel> {
    const { c, eventName } = await this.compute(filter);
    return {
      eventTypeId: filter.eventTypeId,
      eventName,
      totalResults: c.rows.length,
      skipped: c.matrix.skipped,
      grinds: grindsOf(c.matrix),
      cells: c.matrix.cells.map(toCellModel),
      comparisons: c.matrix.comparisons.map((x) => ({ ...x })),
      trials: c.trialCells.map(toTrialCellModel),
      species: speciesSummaries(c, filter.condition),
      settings: toSettingsModel(c),
    };
  }

  async grainCell(filter: GrainMapFilter, speciesId: string, grind: string): Promise<GrainCellDetailModel> {
    const { c } = await this.compute(filter);
    const rows = c.rows
      .filter((r) => r.speciesId === speciesId && r.head?.grind === grind)
      .sort((a, b) => (a.meetDate === b.meetDate ? a.resultId.localeCompare(b.resultId) : a.meetDate < b.meetDate ? 1 : -1))
      .map((r) => {
        const ratio = c.ratios.get(r.resultId)!;
        return {
          resultId: r.resultId, athleteId: r.athleteId, athleteName: r.athleteName, meetName: r.meetName, meetDate: r.meetDate,
          condition: r.condition, diameterMm: r.diameterMm, hundredths: r.hundredths,
          normalisedHundredths: ratio.normalisedHundredths, ratio: ratio.ratio,
          includedDeg: r.head!.includedDeg, chiselWidthMm: r.head!.chiselWidthMm,
        };
      });
    const trialRows = c.trials
      .filter((t) => t.speciesId === speciesId)
      .flatMap((t) =>
        summariseTrial(t)
          .filter((row) => !row.isReference && row.ratioToReference !== null && row.head?.grind === grind)
          .map((row) => ({ trialId: t.trialId, testedOn: t.testedOn, condition: t.condition, diameterMm: t.diameterMm, axeLabel: row.axeLabel, ratioToReference: row.ratioToReference! })),
      );
    return {
      speciesId,
      grind,
      cells: c.matrix.cells.filter((x) => x.speciesId === speciesId && x.grind === grind).map(toCellModel),
      rows,
      trials: c.trialCells.filter((x) => x.speciesId === speciesId && x.grind === grind).map(toTrialCellModel),
      trialRows,
    };
  }

  async csv(filter: GrainMapFilter): Promise<string> {
    return grainMapCsv((await this.compute(filter)).c);
  }

  private async compute(filter: GrainMapFilter): Promise<{ c: GrainComputation; eventName: string }> {
    const event = await this.repo.eventType(filter.eventTypeId);
    if (event === undefined) throw DomainError.badInput('eventTypeId', 'That event type does not exist.');
    if (event.result_kind !== 'TIMED' || Number(event.team_size) !== 1) {
      throw DomainError.badInput('eventTypeId', 'The Grain Map compares single-athlete timed events only.');
    }
    const stamp = await this.repo.stamp(filter);
    const c = await this.cache.get(cacheKey(filter), stamp, async () => {
      const [rows, trials] = await Promise.all([this.repo.raceRows(filter, event.code), this.repo.trialRows(filter)]);
      return computeGrainMap(filter, event.code, rows, trials);
    });
    return { c, eventName: event.name };
  }
}

/** Filter fields in a fixed order, lists sorted, so equal filters share one entry. */
function cacheKey(filter: GrainMapFilter): string {
  const f = filter;
  return JSON.stringify([
    f.eventTypeId, f.division ?? null, [...(f.seasonIds ?? [])].sort(), [...(f.clubIds ?? [])].sort(), f.condition ?? null,
    f.diameterMinMm ?? null, f.diameterMaxMm ?? null, f.bevelBand ?? null, f.chiselBand ?? null,
    !!f.byBevelBand, !!f.byChiselBand, !!f.byCondition, !!f.fittedExponent,
  ]);
}
