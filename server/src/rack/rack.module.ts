import { Inject, Module, type OnModuleInit } from '@nestjs/common';

import { SearchIndexer } from '../search/search-indexer.service.js';
import { AxeSearchSource } from './axe-search-source.js';
import { AxeServicesService } from './axe-services.service.js';
import { AxesService } from './axes.service.js';
import { LineupsResolver } from './lineups/lineups.resolver.js';
import { LineupsService } from './lineups/lineups.service.js';
import { PhotoUrlSigner } from './photos/photo-url-signer.js';
import { PhotosController } from './photos/photos.controller.js';
import { PhotosService } from './photos/photos.service.js';
import { RackRepository } from './rack.repository.js';
import { RackResolver } from './rack.resolver.js';

/** The Rack: a club's axes, their service log and photos, and meet lineups. */
@Module({
  controllers: [PhotosController],
  providers: [RackRepository, PhotoUrlSigner, AxesService, AxeServicesService, PhotosService, LineupsService, RackResolver, LineupsResolver],
  exports: [LineupsService],
})
export class RackModule implements OnModuleInit {
  constructor(
    @Inject(SearchIndexer) private readonly indexer: SearchIndexer,
    @Inject(RackRepository) private readonly repo: RackRepository,
  ) {}

  /** Public axes are searchable beside Field Notes. */
  onModuleInit(): void {
    this.indexer.register(new AxeSearchSource(this.repo));
  }
}
