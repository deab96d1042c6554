import 'reflect-metadata';

// Defaults that match scripts/test.sh, so `npm test -w server` works while its services run.
process.env.NODE_ENV = 'test';
process.env.DB_PORT ??= '3317';
process.env.DB_NAME ??= 'endgrain_test';
process.env.SEARCH_URL ??= 'http://127.0.0.1:7710';
process.env.SMTP_URL ??= 'smtp://127.0.0.1:1035';
process.env.MAIL_VIEWER_URL ??= 'http://127.0.0.1:1090';
process.env.PUBLIC_URL ??= 'http://127.0.0.1:3010';

// @nestjs/graphql keeps its type metadata on the process-wide global. Jest gives each test file
// fresh module instances but (in ESM mode) the same global, so classes decorated by an earlier
// file would leak into this file's schema. Start every test file with empty storages.
const shared = globalThis as Record<string, unknown>;
delete shared.GqlTypeMetadataStorage;
delete shared.GqlLazyMetadataStorageHost;
