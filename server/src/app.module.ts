import { ApolloDriver, type ApolloDriverConfig } from '@nestjs/apollo';
import { Module } from '@nestjs/common';
import { APP_FILTER } from '@nestjs/core';
import { GraphQLModule } from '@nestjs/graphql';
import { TypeOrmModule } from '@nestjs/typeorm';

import { AuthModule } from './auth/auth.module.js';
import { DomainErrorFilter } from './common/errors/domain-error.filter.js';
import { graphqlOptions } from './common/graphql/graphql-options.js';
import { ConfigModule } from './config/config.module.js';
import { APP_CONFIG } from './config/load-config.js';
import type { AppConfig } from './config/env.schema.js';
import { dataSourceOptions } from './database/data-source.js';
import { FieldNotesModule } from './field-notes/field-notes.module.js';
import { HealthModule } from './health/health.module.js';
import { InsightsModule } from './insights/insights.module.js';
import { LeagueModule } from './league/league.module.js';
import { MailModule } from './mail/mail.module.js';
import { MeetsModule } from './meets/meets.module.js';
import { RackModule } from './rack/rack.module.js';
import { ResultsModule } from './results/results.module.js';
import { SearchModule } from './search/search.module.js';
import { TrialsModule } from './trials/trials.module.js';
import { UsersModule } from './users/users.module.js';

@Module({
  imports: [
    ConfigModule,
    TypeOrmModule.forRootAsync({ inject: [APP_CONFIG], useFactory: (config: AppConfig) => dataSourceOptions(config) }),
    GraphQLModule.forRootAsync<ApolloDriverConfig>({
      driver: ApolloDriver,
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => graphqlOptions(config),
    }),
    MailModule,
    SearchModule,
    AuthModule,
    UsersModule,
    HealthModule,
    LeagueModule,
    MeetsModule,
    RackModule,
    ResultsModule,
    FieldNotesModule,
    InsightsModule,
    TrialsModule,
  ],
  providers: [{ provide: APP_FILTER, useClass: DomainErrorFilter }],
})
export class AppModule {}
