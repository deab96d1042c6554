import { ApolloArmor } from '@escape.tech/graphql-armor';
import type { ApolloDriverConfig } from '@nestjs/apollo';

import type { AppConfig } from '../../config/env.schema.js';
import { formatGraphqlError } from './format-error.js';

/** Apollo settings: depth, alias and cost limits; no introspection or suggestions in production. */
export function graphqlOptions(config: AppConfig): ApolloDriverConfig {
  const production = config.NODE_ENV === 'production';
  const armor = new ApolloArmor({
    maxDepth: { n: 10, ignoreIntrospection: false, flattenFragments: true },
    maxAliases: { n: 15 },
    costLimit: { maxCost: 5000 },
    maxTokens: { n: 2000 },
    maxDirectives: { n: 20 },
    blockFieldSuggestion: { enabled: production },
  });
  const protection = armor.protect();
  return {
    autoSchemaFile: true,
    sortSchema: true,
    path: '/graphql',
    introspection: !production,
    playground: false,
    includeStacktraceInErrorResponses: false,
    // The armour ships types from Apollo's CommonJS build; the plugins are the same objects.
    plugins: [...protection.plugins] as NonNullable<ApolloDriverConfig['plugins']>,
    validationRules: [...protection.validationRules],
    formatError: formatGraphqlError,
    context: ({ req }: { req: unknown }) => ({ req }),
  };
}
