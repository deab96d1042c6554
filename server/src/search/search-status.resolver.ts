import { Inject } from '@nestjs/common';
import { Field, Int, ObjectType, Query, Resolver } from '@nestjs/graphql';

import { Roles } from '../common/auth/roles.decorator.js';
import { SearchOutboxRepository } from './search-outbox.repository.js';
import { SearchService } from './search.service.js';

@ObjectType('SearchIndexStatus')
export class SearchIndexStatusModel {
  @Field(() => Boolean, { description: 'The search service answers its health check' })
  healthy: boolean;

  @Field(() => Int, { description: 'Documents waiting in the outbox to be (re)indexed' })
  pending: number;

  @Field(() => Int, { description: 'Of those, how many have failed at least once and wait for a retry' })
  failing: number;

  @Field(() => String, { nullable: true })
  lastError: string | null;
}

@Resolver()
export class SearchStatusResolver {
  constructor(
    @Inject(SearchService) private readonly searchService: SearchService,
    @Inject(SearchOutboxRepository) private readonly outbox: SearchOutboxRepository,
  ) {}

  @Query(() => SearchIndexStatusModel, { description: 'Whether search is keeping up with the database' })
  @Roles('ADMIN')
  async searchIndexStatus(): Promise<SearchIndexStatusModel> {
    const [healthy, state] = await Promise.all([this.searchService.isHealthy(), this.outbox.state()]);
    return { healthy, ...state };
  }
}
