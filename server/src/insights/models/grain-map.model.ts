import { Field, Float, ID, Int, ObjectType } from '@nestjs/graphql';

@ObjectType({ description: 'One species × grind (× band/condition) cell of race times' })
export class GrainCellModel {
  @Field(() => String) key: string;
  @Field(() => String) speciesId: string;
  @Field(() => String) grind: string;
  @Field(() => String, { nullable: true }) condition: string | null;
  @Field(() => String, { nullable: true }) bevelBand: string | null;
  @Field(() => String, { nullable: true }) bevelBandLabel: string | null;
  @Field(() => String, { nullable: true }) chiselBand: string | null;
  @Field(() => String, { nullable: true }) chiselBandLabel: string | null;
  @Field(() => Int) results: number;
  @Field(() => Int) athletes: number;
  @Field(() => Float, { description: 'Median normalised time, hundredths' }) medianHundredths: number;
  @Field(() => Float) lowHundredths: number;
  @Field(() => Float) highHundredths: number;
  @Field(() => Float) q1Hundredths: number;
  @Field(() => Float) q3Hundredths: number;
  @Field(() => Float, { nullable: true, description: 'Median within-athlete ratio; below 1 is faster than usual' }) effect: number | null;
  @Field(() => Float, { nullable: true }) effectLow: number | null;
  @Field(() => Float, { nullable: true }) effectHigh: number | null;
  @Field(() => Int) effectResults: number;
  @Field(() => Int) effectAthletes: number;
  @Field(() => Boolean) clearDifference: boolean;
  @Field(() => String, { description: 'strong, suggestive or not-enough-data' }) label: string;
}

@ObjectType()
export class GrindComparisonModel {
  @Field(() => String) speciesId: string;
  @Field(() => String, { nullable: true }) condition: string | null;
  @Field(() => String) grindA: string;
  @Field(() => String) grindB: string;
  @Field(() => Float) medianRatioA: number;
  @Field(() => Float) medianRatioB: number;
  @Field(() => Int) resultsA: number;
  @Field(() => Int) resultsB: number;
  @Field(() => Float) pTwoSided: number;
  @Field(() => Float) pAdjusted: number;
  @Field(() => String, { nullable: true }) faster: string | null;
  @Field(() => String) label: string;
}

@ObjectType({ description: 'Depth-per-swing ratios to the reference axe, from published trials' })
export class TrialCellModel {
  @Field(() => String) key: string;
  @Field(() => String) speciesId: string;
  @Field(() => String) condition: string;
  @Field(() => String) grind: string;
  @Field(() => Int) axeRows: number;
  @Field(() => Int) trials: number;
  @Field(() => Float) ratio: number;
  @Field(() => Float) ratioLow: number;
  @Field(() => Float) ratioHigh: number;
  @Field(() => String) label: string;
}

@ObjectType({ description: 'A species on the map: its sentence and its published properties' })
export class GrainSpeciesModel {
  @Field(() => String) speciesId: string;
  @Field(() => String) name: string;
  @Field(() => String) sentence: string;
  @Field(() => Int) results: number;
  @Field(() => Float, { nullable: true }) specificGravityGreen: number | null;
  @Field(() => Float, { nullable: true }) specificGravityDry: number | null;
  @Field(() => Float, { nullable: true }) hardnessLbfGreen: number | null;
  @Field(() => Float, { nullable: true }) hardnessLbfDry: number | null;
  @Field(() => String, { nullable: true }) source: string | null;
  @Field(() => Float, { nullable: true, description: 'Kruskal–Wallis p across the grinds on this wood' }) grindsP: number | null;
}

@ObjectType()
export class GrainSettingsModel {
  @Field(() => Float) referenceMm: number;
  @Field(() => Float) exponent: number;
  @Field(() => String, { description: 'default or fitted' }) exponentSource: string;
  @Field(() => Float, { nullable: true }) exponentLow: number | null;
  @Field(() => Float, { nullable: true }) exponentHigh: number | null;
  @Field(() => Int) exponentResults: number;
  @Field(() => Int) exponentAthletes: number;
  @Field(() => String) exponentNote: string;
  @Field(() => Int) resamples: number;
  @Field(() => Int) seed: number;
  @Field(() => Float) level: number;
  @Field(() => Int) minResults: number;
  @Field(() => Int) minAthletes: number;
  @Field(() => Int) strongMinResults: number;
  @Field(() => Int) strongMinAthletes: number;
  @Field(() => Float) strongMaxP: number;
  @Field(() => Float) clearMaxP: number;
}

@ObjectType()
export class GrainMapModel {
  @Field(() => ID) eventTypeId: string;
  @Field(() => String) eventName: string;
  @Field(() => Int) totalResults: number;
  @Field(() => Int, { description: 'Results left out because no head was recorded' }) skipped: number;
  @Field(() => [String]) grinds: string[];
  @Field(() => [GrainCellModel]) cells: GrainCellModel[];
  @Field(() => [GrindComparisonModel]) comparisons: GrindComparisonModel[];
  @Field(() => [TrialCellModel]) trials: TrialCellModel[];
  @Field(() => [GrainSpeciesModel]) species: GrainSpeciesModel[];
  @Field(() => GrainSettingsModel) settings: GrainSettingsModel;
}

@ObjectType({ description: 'One result behind a cell' })
export class GrainRowModel {
  @Field(() => ID) resultId: string;
  @Field(() => ID) athleteId: string;
  @Field(() => String) athleteName: string;
  @Field(() => String) meetName: string;
  @Field(() => String) meetDate: string;
  @Field(() => String, { nullable: true }) condition: string | null;
  @Field(() => Float) diameterMm: number;
  @Field(() => Int) hundredths: number;
  @Field(() => Float) normalisedHundredths: number;
  @Field(() => Float, { nullable: true }) ratio: number | null;
  @Field(() => Float, { nullable: true }) includedDeg: number | null;
  @Field(() => Float, { nullable: true }) chiselWidthMm: number | null;
}

@ObjectType({ description: 'One axe on one trial block, behind a cell' })
export class GrainTrialRowModel {
  @Field(() => ID) trialId: string;
  @Field(() => String) testedOn: string;
  @Field(() => String) condition: string;
  @Field(() => Float) diameterMm: number;
  @Field(() => String) axeLabel: string;
  @Field(() => Float) ratioToReference: number;
}

@ObjectType()
export class GrainCellDetailModel {
  @Field(() => String) speciesId: string;
  @Field(() => String) grind: string;
  @Field(() => [GrainCellModel], { description: 'The cell, or its band/condition splits' }) cells: GrainCellModel[];
  @Field(() => [GrainRowModel]) rows: GrainRowModel[];
  @Field(() => [TrialCellModel]) trials: TrialCellModel[];
  @Field(() => [GrainTrialRowModel]) trialRows: GrainTrialRowModel[];
}
