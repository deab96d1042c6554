import { Controller, Get, Inject, Query, Res } from '@nestjs/common';
import { DIVISION_LABELS, formatCsv, formatTime, type Division } from '@endgrain/shared';
import type { Response } from 'express';

import { Public } from '../../common/auth/public.decorator.js';
import type { ResultModel } from '../models/result.model.js';
import { ResultsBrowseService } from '../results-browse.service.js';
import { exportQuery } from './export-query.js';

const HEADER = [
  'meet', 'date', 'event', 'division', 'place', 'athletes', 'club', 'time', 'watch times', 'penalty (s)', 'score', 'points', 'status', 'reason',
  'axe label', 'grind', 'bevel angle (°)', 'chisel width (mm)', 'species', 'diameter (mm)', 'condition',
];

/** GET /api/results.csv?…: the explorer's current filter as a CSV file, published results only. */
@Controller('api')
export class ResultsExportController {
  constructor(@Inject(ResultsBrowseService) private readonly browseService: ResultsBrowseService) {}

  @Get('results.csv')
  @Public()
  async export(@Query() query: Record<string, unknown>, @Res() res: Response): Promise<void> {
    const { filter, sort } = exportQuery(query);
    res.status(200);
    res.setHeader('content-type', 'text/csv; charset=utf-8');
    res.setHeader('content-disposition', 'attachment; filename="endgrain-results.csv"');
    // A byte-order mark so spreadsheet programs read the file as UTF-8.
    res.write(`\uFEFF${formatCsv([HEADER])}`);
    for await (const rows of this.browseService.exportRows(filter, sort)) res.write(formatCsv(rows.map(csvRow)));
    res.end();
  }
}

function csvRow(r: ResultModel): (string | number | null)[] {
  const time = (hundredths: number | null): string | null => (hundredths === null ? null : formatTime(hundredths));
  return [
    r.meetName, r.meetDate, r.eventName, DIVISION_LABELS[r.division as Division], r.place, r.label, r.clubName, time(r.totalHundredths),
    r.rawTimes.map((t) => formatTime(t)).join(' / '), r.penaltyHundredths ? r.penaltyHundredths / 100 : null, r.score, r.points,
    r.status.toLowerCase().replace(/_/g, ' '), r.reason, r.axeLabel, r.grind?.toLowerCase() ?? null, r.bevelIncludedDeg, r.chiselWidthMm,
    r.speciesName, r.diameterMm, r.condition?.toLowerCase() ?? null,
  ];
}
