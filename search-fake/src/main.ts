import { readConfig } from './read-config.js';
import { startSearchFake } from './server.js';

try {
  const config = readConfig(process.env);
  const fake = await startSearchFake(config);
  process.stdout.write(`search-fake listening on ${fake.url}\n`);
  const stop = (): void => {
    fake.close().then(() => process.exit(0), (error: unknown) => {
      process.stderr.write(`search-fake: ${String(error)}\n`);
      process.exit(1);
    });
  };
  process.once('SIGTERM', stop);
  process.once('SIGINT', stop);
} catch (error) {
  process.stderr.write(`search-fake: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
}
