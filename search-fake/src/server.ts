import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { resolve } from 'node:path';

import { ApiError } from './api-error.js';
import { authorize, deriveApiKeys, type ApiKey } from './api-keys.js';
import { Engine } from './engine.js';
import { parseBody, readBody, sendJson } from './http-io.js';
import { matchRoute, type Route } from './route-table.js';
import { documentRoutes } from './routes/document-routes.js';
import { indexRoutes } from './routes/index-routes.js';
import { searchRoutes } from './routes/search-routes.js';
import { serviceRoutes } from './routes/service-routes.js';
import { settingsRoutes } from './routes/settings-routes.js';
import { SnapshotStore } from './snapshot-store.js';

export const DEFAULT_MASTER_KEY = 'endgrain-dev-search-master-key';

export interface SearchFakeOptions {
  /** 0 picks a free port (tests). Default 7700. */
  port?: number;
  host?: string;
  /** `null` runs without keys, as the service does when started without a master key. */
  masterKey?: string | null;
  /** Where the snapshot file lives. Default `.data/search` under the current directory. */
  dataDir?: string;
  /** How long a task waits before it runs, like the service's indexing latency. Default 10 ms. */
  taskDelayMs?: number;
}

export interface SearchFake {
  url: string;
  /** The derived default keys, as `GET /keys` lists them. */
  keys: readonly ApiKey[];
  close(): Promise<void>;
}

// Static segments first, so `documents/fetch` wins over `documents/:id` for the same method.
const ROUTES: Route[] = [...serviceRoutes, ...indexRoutes, ...settingsRoutes, ...searchRoutes, ...documentRoutes];
const DOCUMENT_TYPES = ['application/json', 'application/x-ndjson'];

/** Starts the local search service; resolves once it listens. */
export async function startSearchFake(options: SearchFakeOptions = {}): Promise<SearchFake> {
  const masterKey = options.masterKey === undefined ? DEFAULT_MASTER_KEY : options.masterKey === '' ? null : options.masterKey;
  const store = new SnapshotStore(resolve(options.dataDir ?? '.data/search'), () => engine.toSnapshot());
  const engine: Engine = new Engine({
    taskDelayMs: options.taskDelayMs ?? 10,
    onChange: () => store.schedule(),
    snapshot: store.load(),
  });
  const keys = masterKey === null ? [] : deriveApiKeys(masterKey, engine.createdAt);

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    try {
      // Read the body first so an early error never leaves a half-read request on a kept-alive socket.
      const text = await readBody(req);
      const url = new URL(req.url ?? '/', 'http://search-fake.invalid');
      const { route, params } = matchRoute(ROUTES, req.method ?? 'GET', url.pathname);
      if (route.action !== null) authorize(req.headers.authorization, route.action, masterKey, keys);
      const contentType = (req.headers['content-type'] ?? 'application/json').toLowerCase();
      if (route.documents && text !== '' && !DOCUMENT_TYPES.some((type) => contentType.startsWith(type))) {
        throw new ApiError('invalid_content_type', `Documents are sent as ${DOCUMENT_TYPES.join(' or ')}, not \`${contentType}\`.`);
      }
      const body = parseBody(text, { contentType, documents: route.documents });
      const reply = route.handle({ engine, params, query: url.searchParams, body, masterKey, keys });
      sendJson(res, reply.status, reply.body);
    } catch (error) {
      const apiError = ApiError.from(error);
      if (apiError.status >= 500) process.stderr.write(`search-fake: ${(error as Error).stack ?? apiError.message}\n`);
      if (apiError.code === 'payload_too_large') res.setHeader('Connection', 'close');
      sendJson(res, apiError.status, apiError.toBody());
    }
  }

  const server = createServer((req, res) => void handle(req, res));
  await new Promise<void>((resolveListen, reject) => {
    server.once('error', reject);
    server.listen(options.port ?? 7700, options.host ?? '127.0.0.1', () => resolveListen());
  });
  const address = server.address() as AddressInfo;
  const host = address.family === 'IPv6' ? `[${address.address}]` : address.address;
  let closing: Promise<void> | null = null;

  return {
    url: `http://${host}:${address.port}`,
    keys,
    close() {
      closing ??= (async () => {
        await new Promise<void>((done) => {
          server.close(() => done());
          server.closeAllConnections();
        });
        // Acknowledged writes are applied before the last snapshot, so none is lost.
        engine.tasks.drain();
        await store.flush();
      })();
      return closing;
    },
  };
}
