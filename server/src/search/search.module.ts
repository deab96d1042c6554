import { Global, Module } from '@nestjs/common';

import { SearchConfigController } from './search-config.controller.js';
import { SearchIndexer } from './search-indexer.service.js';
import { SearchKeyService } from './search-key.service.js';
import { SearchOutboxRepository } from './search-outbox.repository.js';
import { SearchRelayController } from './search-relay.controller.js';
import { SearchStatusResolver } from './search-status.resolver.js';
import { SearchService } from './search.service.js';

@Global()
@Module({
  controllers: [SearchConfigController, SearchRelayController],
  providers: [SearchService, SearchKeyService, SearchOutboxRepository, SearchIndexer, SearchStatusResolver],
  exports: [SearchService, SearchOutboxRepository, SearchIndexer],
})
export class SearchModule {}
