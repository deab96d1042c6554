import { Module } from '@nestjs/common';

import { LeagueModule } from '../league/league.module.js';
import { MeetsModule } from '../meets/meets.module.js';
import { ResultsExportController } from './export/results-export.controller.js';
import { ResultsImportController } from './import/results-import.controller.js';
import { ResultsImportService } from './import/results-import.service.js';
import { MeetRescorer } from './meet-rescorer.js';
import { PublishService } from './publish.service.js';
import { ResultHydrator } from './result-hydrator.js';
import { ResultsBrowseService } from './results-browse.service.js';
import { ResultsExplorerRepository } from './results-explorer.repository.js';
import { ResultsReadRepository } from './results-read.repository.js';
import { ResultsWriter } from './results-writer.js';
import { ResultsRepository } from './results.repository.js';
import { ResultsResolver } from './results.resolver.js';
import { ResultsService } from './results.service.js';
import { StandingsResolver } from './standings.resolver.js';
import { StandingsService } from './standings.service.js';

@Module({
  imports: [LeagueModule, MeetsModule],
  providers: [
    ResultsRepository, ResultsReadRepository, ResultsExplorerRepository, ResultsWriter, ResultHydrator,
    ResultsService, StandingsService, ResultsBrowseService, PublishService, ResultsImportService, ResultsResolver, StandingsResolver, MeetRescorer,
  ],
  controllers: [ResultsImportController, ResultsExportController],
})
export class ResultsModule {}
