import { Module } from '@nestjs/common';

import { GrainMapCsvController } from './grain-map-csv.controller.js';
import { HandicapService } from './handicap.service.js';
import { InsightsRepository } from './insights.repository.js';
import { InsightsResolver } from './insights.resolver.js';
import { InsightsService } from './insights.service.js';

@Module({
  controllers: [GrainMapCsvController],
  providers: [InsightsRepository, InsightsService, HandicapService, InsightsResolver],
})
export class InsightsModule {}
