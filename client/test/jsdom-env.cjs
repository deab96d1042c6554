// jsdom without the web platform pieces Node already has; Apollo, MUI X and fetch-based code need them.
// AbortController stays jsdom's own: mixing Node's with jsdom's AbortSignal breaks fetch and events.
const { TestEnvironment } = require('jest-environment-jsdom');
const { TextEncoder, TextDecoder } = require('node:util');
const { ReadableStream, WritableStream, TransformStream } = require('node:stream/web');

class EndgrainJsdomEnvironment extends TestEnvironment {
  constructor(config, context) {
    super(config, context);
    const copied = {
      TextEncoder,
      TextDecoder,
      ReadableStream,
      WritableStream,
      TransformStream,
      fetch: globalThis.fetch,
      Request: globalThis.Request,
      Response: globalThis.Response,
      Headers: globalThis.Headers,
      structuredClone: globalThis.structuredClone,
    };
    for (const [name, value] of Object.entries(copied)) {
      if (typeof this.global[name] === 'undefined') this.global[name] = value;
    }
  }
}

module.exports = EndgrainJsdomEnvironment;
